import { Routes } from '@angular/router';
import { permissionGuard } from '../auth/permission-guard';
import { MachineSettingsPage } from './machine-settings-page';

export default [
  { path: '', pathMatch: 'full', redirectTo: 'machine' },
  { path: 'machine', component: MachineSettingsPage, canActivate: [permissionGuard('manageShopSettings')], title: 'Machine · Borewright' },
] satisfies Routes;
