import type { Role } from '../../shared/api/contract';

/** The demo shop's password for every account; README.md prints it. Refused in production unless allowed. */
export const DEMO_PASSWORD = 'greyfield-demo';

/** The demo shop's name. */
export const DEMO_SHOP_NAME = 'Greyfield Joinery';

export interface DemoPerson {
  email: string;
  name: string;
  role: Role;
}

/** Greyfield Joinery, an invented four-person shop (design.md §7): one person per role. */
export const DEMO_PEOPLE: readonly DemoPerson[] = [
  { email: 'owner@greyfield.example', name: 'Ruth Greyfield', role: 'admin' },
  { email: 'designer@greyfield.example', name: 'Tomas Ward', role: 'designer' },
  { email: 'bench@greyfield.example', name: 'Ada Keel', role: 'bench' },
  { email: 'viewer@greyfield.example', name: 'Sam Fitter', role: 'viewer' },
];
