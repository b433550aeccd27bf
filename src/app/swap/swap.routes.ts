import { Routes } from '@angular/router';
import { SwapCheck } from './swap-check';

export default [{ path: '', component: SwapCheck, title: 'Swap check · Borewright' }] satisfies Routes;
