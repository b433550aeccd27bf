import * as z from 'zod';
import { carcass } from '../model/job-document';
import { panelRecord } from './contract';

/** What POST /api/jobs/:jobId/plan answers: the carcass it added and its panels as stored. */
export const plannedCarcass = z.object({ carcass, panels: z.array(panelRecord) });
export type PlannedCarcass = z.output<typeof plannedCarcass>;
