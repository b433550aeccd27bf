import { Routes } from '@angular/router';
import { BenchPage } from './bench-page';

export default [{ path: '', component: BenchPage, title: 'Bench · Borewright' }] satisfies Routes;
