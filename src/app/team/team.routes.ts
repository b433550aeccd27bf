import { Routes } from '@angular/router';
import { permissionGuard } from '../auth/permission-guard';
import { TeamPage } from './team-page';

export default [{ path: '', component: TeamPage, canActivate: [permissionGuard('manageTeam')], title: 'Team · Borewright' }] satisfies Routes;
