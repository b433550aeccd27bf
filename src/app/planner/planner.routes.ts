import { Routes } from '@angular/router';
import { CarcassPlanner } from './carcass-planner';

export default [{ path: '', component: CarcassPlanner, title: 'Carcass planner · Borewright' }] satisfies Routes;
