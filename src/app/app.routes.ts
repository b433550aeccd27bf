import { Routes } from '@angular/router';
import { authGuard } from './auth/auth-guard';
import { Shell } from './layout/shell';

export const routes: Routes = [
  { path: 'sign-in', loadChildren: () => import('./auth/auth.routes') },
  {
    path: '',
    component: Shell,
    canActivate: [authGuard],
    children: [
      { path: '', pathMatch: 'full', redirectTo: 'jobs' },
      { path: 'jobs', loadChildren: () => import('./jobs/jobs.routes') },
      { path: 'jobs/:jobId/panels/:panelId', loadChildren: () => import('./editor/editor.routes') },
      { path: 'outbox', loadChildren: () => import('./outbox/outbox.routes') },
      { path: 'jobs/:jobId/plan', loadChildren: () => import('./planner/planner.routes') },
    ],
  },
  { path: '**', redirectTo: 'jobs' },
];
