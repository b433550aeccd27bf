import { TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import { JobDetail, JobSummary, PanelRecord, Role, User } from '../../shared/api/contract';
import { AuthStore } from '../app/auth/auth-store';

/** Test data shaped exactly as the API answers, so specs exercise the contract's schemas. */
export function aUser(role: Role, units: User['units'] = 'mm'): User {
  return { id: 3, email: `${role}@greyfield.example`, name: `Demo ${role}`, role, units };
}

export function aJobSummary(changes: Partial<JobSummary> = {}): JobSummary {
  return {
    id: 11,
    name: 'Larch Lane kitchen',
    client: 'R. Hale',
    archived: false,
    version: 3,
    carcassCount: 1,
    panelCount: 2,
    updatedAt: '2026-11-30T09:15:00.000Z',
    ...changes,
  };
}

export function aPanel(changes: Partial<PanelRecord> = {}): PanelRecord {
  return {
    dbId: 101,
    version: 4,
    updatedAt: '2026-11-30T09:15:00.000Z',
    id: 'b1-side-left',
    name: 'Left side',
    role: 'side',
    carcass: 'b1',
    width: 560,
    height: 720,
    thickness: 18,
    material: 'pb18',
    status: 'planned',
    statusBy: null,
    statusAt: null,
    placements: [],
    bores: [],
    ...changes,
  };
}

export function aJobDetail(panels: PanelRecord[] = [aPanel(), aPanel({ dbId: 102, id: 'b1-door', name: 'Door', role: 'door' })]): JobDetail {
  return {
    job: { ...aJobSummary({ panelCount: panels.length }), notes: 'Soft-close everywhere.' },
    materials: [
      { id: 'pb18', name: 'Particleboard 18 white', thickness: 18, density: 650, modulus: 3500 },
      { id: 'mdf19', name: 'MDF 19 lacquer', thickness: 19, density: 750, modulus: 3800 },
    ],
    system: { pitch: 32, setback: 37, holeDiameter: 5, holeDepth: 13 },
    limits: { minWeb: 3, minEdge: 3, minFloor: 3, sagRatio: 144 },
    carcasses: [{ id: 'b1', name: 'Base 600', width: 600, height: 720, depth: 560, material: 'pb18', mounting: 'floor' }],
    panels,
  };
}

/** Signs the given role in through the API's `me` answer, as the app does at start. */
export async function signInAs(role: Role): Promise<void> {
  const restoring = TestBed.inject(AuthStore).restoreSession();
  TestBed.inject(HttpTestingController).expectOne('/api/auth/session').flush({ user: aUser(role) });
  await restoring;
}

/** Lets pending promises, navigations and effects move on to their next request. */
export function settle(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve));
}

/** What a screen reader announces for a control: its aria-label, else its text without the (aria-hidden) icon ligature. */
export function accessibleName(element: Element): string {
  const text = element.cloneNode(true) as Element;
  text.querySelectorAll('mat-icon').forEach((icon) => icon.remove());
  return (element.getAttribute('aria-label') ?? text.textContent ?? '').trim();
}

/** The button with this accessible name anywhere in the document (dialogs and menus live in the overlay). */
export function buttonNamed(name: string): HTMLButtonElement | undefined {
  return [...document.querySelectorAll('button')].find((b) => accessibleName(b) === name);
}
