import { Routes } from '@angular/router';
import { OutboxPage } from './outbox-page';

export default [{ path: '', component: OutboxPage, title: 'Outbox · Borewright' }] satisfies Routes;
