import { Routes } from '@angular/router';
import { HowItWorks } from './how-it-works';

export default [{ path: '', component: HowItWorks, title: 'How Borewright works · Borewright' }] satisfies Routes;
