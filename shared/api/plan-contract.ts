import * as z from 'zod';
import { carcass } from '../model/job-document';
import { panelRecord } from './contract';

/**
 * What POST /api/jobs/:jobId/plan answers: the carcass it added or planned again, its panels as
 * stored, and the ids of panels changed by hand that it kept as they were.
 */
export const plannedCarcass = z.object({ carcass, panels: z.array(panelRecord), kept: z.array(z.string()) });

/** `?changed=` on a re-plan: what to do with panels changed by hand since the carcass was planned. */
export const planQuery = z.object({ changed: z.enum(['keep', 'replace']).optional() });
export type PlannedCarcass = z.output<typeof plannedCarcass>;
