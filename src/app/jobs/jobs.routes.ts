import { Routes } from '@angular/router';
import { JobList } from './job-list';
import { JobPage } from './job-page';

export default [
  { path: '', component: JobList, title: 'Jobs · Borewright' },
  { path: ':jobId', component: JobPage, title: 'Job · Borewright' },
] satisfies Routes;
