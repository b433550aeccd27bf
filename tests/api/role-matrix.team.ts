import { DEMO_PEOPLE } from '../../server/demo/greyfield-people';
import type { Row } from './role-matrix-row';

/** Each admin invitation goes to an address of its own, so none replaces another. */
let invited = 0;

/**
 * The demo seed inserts its people in DEMO_PEOPLE's order into an empty table, so the viewer's id is
 * its place in that list. Setting the viewer's role to what it is already changes nothing.
 */
const VIEWER_ID = DEMO_PEOPLE.findIndex((p) => p.role === 'viewer') + 1;

/**
 * A token of the right shape that was never issued. The public link routes take no sign-in (the token
 * is the permission), so every actor alike gets the answer for an unknown link: 404. Valid, used,
 * expired and withdrawn links are tested in server/team/invitations.spec.ts and password-reset.spec.ts.
 */
const UNKNOWN_TOKEN = 'A'.repeat(43);

/** The team's routes (issue 7 part 5): admins manage the team; the mailed links work for whoever holds them. */
export const TEAM_ROUTES: Record<string, Row> = {
  'GET /api/team': { request: (c) => c.get('/api/team'), expect: [401, 200, 403, 403, 403] },
  'POST /api/team/invitations': {
    request: (c) => c.post('/api/team/invitations').send({ email: `matrix-${++invited}@example.com`, role: 'viewer' }),
    expect: [401, 201, 403, 403, 403],
  },
  // No such invitation: the admin gets past the permission and is told so; nobody else gets that far.
  'DELETE /api/team/invitations/:invitationId': { request: (c) => c.delete('/api/team/invitations/999999'), expect: [401, 404, 403, 403, 403] },
  'PATCH /api/team/members/:userId': {
    request: (c) => c.patch(`/api/team/members/${VIEWER_ID}`).send({ role: 'viewer' }),
    expect: [401, 200, 403, 403, 403],
  },
  'GET /api/invitations/:token': { request: (c) => c.get(`/api/invitations/${UNKNOWN_TOKEN}`), expect: [404, 404, 404, 404, 404] },
  'POST /api/invitations/:token/accept': {
    request: (c) => c.post(`/api/invitations/${UNKNOWN_TOKEN}/accept`).send({ name: 'Nobody', password: 'long enough password' }),
    expect: [404, 404, 404, 404, 404],
  },
  // The same 202 for everyone and every address, member or not (an unknown one here).
  'POST /api/auth/password-reset': {
    request: (c, _f, actor) => c.post('/api/auth/password-reset').send({ email: `nobody-${actor.replace(' ', '-')}@greyfield.example` }),
    expect: [202, 202, 202, 202, 202],
  },
  'GET /api/auth/password-reset/:token': { request: (c) => c.get(`/api/auth/password-reset/${UNKNOWN_TOKEN}`), expect: [404, 404, 404, 404, 404] },
  'POST /api/auth/password-reset/:token': {
    request: (c) => c.post(`/api/auth/password-reset/${UNKNOWN_TOKEN}`).send({ password: 'long enough password' }),
    expect: [404, 404, 404, 404, 404],
  },
};
