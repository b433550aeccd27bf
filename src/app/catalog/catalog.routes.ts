import { Routes } from '@angular/router';
import { CatalogPage } from './catalog-page';

export default [{ path: '', component: CatalogPage, title: 'Catalog · Borewright' }] satisfies Routes;
