import { Routes } from '@angular/router';
import { authGuard } from './auth/auth-guard';

export const routes: Routes = [
  { path: 'sign-in', loadChildren: () => import('./auth/auth.routes') },
  // The pages behind the links we mail: outside the signed-in shell, as their readers are not signed in.
  {
    path: 'accept-invitation',
    loadComponent: () => import('./auth/accept-invitation').then((m) => m.AcceptInvitation),
    title: 'Join the shop · Borewright',
  },
  {
    path: 'forgot-password',
    loadComponent: () => import('./auth/forgot-password').then((m) => m.ForgotPassword),
    title: 'Forgot password · Borewright',
  },
  {
    path: 'create-shop',
    loadComponent: () => import('./auth/create-shop').then((m) => m.CreateShop),
    title: 'Create a shop · Borewright',
  },
  {
    path: 'create-shop/confirm',
    loadComponent: () => import('./auth/confirm-shop').then((m) => m.ConfirmShop),
    title: 'Confirm your shop · Borewright',
  },
  {
    path: 'reset-password',
    loadComponent: () => import('./auth/reset-password').then((m) => m.ResetPassword),
    title: 'New password · Borewright',
  },
  {
    path: '',
    // Loaded with the first signed-in page, not before: the sign-in page needs none of its Material widgets.
    loadComponent: () => import('./layout/shell').then((m) => m.Shell),
    canActivate: [authGuard],
    children: [
      { path: '', pathMatch: 'full', redirectTo: 'jobs' },
      { path: 'jobs', loadChildren: () => import('./jobs/jobs.routes') },
      { path: 'jobs/:jobId/panels/:panelId', loadChildren: () => import('./editor/editor.routes') },
      { path: 'outbox', loadChildren: () => import('./outbox/outbox.routes') },
      { path: 'catalog', loadChildren: () => import('./catalog/catalog.routes') },
      { path: 'bench', loadChildren: () => import('./bench/bench.routes') },
      { path: 'team', loadChildren: () => import('./team/team.routes') },
      { path: 'how-it-works', loadChildren: () => import('./help/help.routes') },
      { path: 'settings', loadChildren: () => import('./settings/settings.routes') },
      { path: 'jobs/:jobId/plan', loadChildren: () => import('./planner/planner.routes') },
      { path: 'jobs/:jobId/swap', loadChildren: () => import('./swap/swap.routes') },
    ],
  },
  { path: '**', redirectTo: 'jobs' },
];
