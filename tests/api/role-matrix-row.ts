import type { Test } from 'supertest';
import type { PanelRecord, Role } from '../../shared/api/contract';
import { DEMO_PEOPLE } from '../../server/demo/greyfield-people';
import type { ApiClient } from '../../server/testing/api-client';

/**
 * The shape of the role matrix (role-matrix.spec.ts): one row per API route. Features keep their
 * rows in a file of their own beside the spec (`role-matrix.<feature>.ts`) and the spec spreads them in.
 */
export type Actor = 'signed out' | Role;
export const ACTORS: Actor[] = ['signed out', 'admin', 'designer', 'bench', 'viewer'];
export const emailOf = (actor: Actor) => DEMO_PEOPLE.find((p) => p.role === actor)?.email ?? 'viewer@greyfield.example';

/** A job of its own for each request that changes something, so no request sees another's change. */
export interface Fixture {
  jobId: number;
  panel: PanelRecord;
}

export interface Row {
  request: (client: ApiClient, fixture: Fixture, actor: Actor) => Test;
  /** Statuses for signed out, admin, designer, bench, viewer (design.md §1). */
  expect: [number, number, number, number, number];
  /** Sign-in and sign-out change the session itself: each actor gets a client of its own. */
  ownClient?: boolean;
}
