import { Routes } from '@angular/router';
import { SignIn } from './sign-in';

export default [{ path: '', component: SignIn, title: 'Sign in · Borewright' }] satisfies Routes;
