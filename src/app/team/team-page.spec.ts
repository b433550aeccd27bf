import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { TeamAnswer, TeamMember } from '../../../shared/api/team-contract';
import { accessibleName, buttonNamed, settle, signInAs } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { TeamPage } from './team-page';

const member = (id: number, name: string, role: TeamMember['role'], active = true): TeamMember => ({
  id,
  name,
  email: `${name.split(' ')[0].toLowerCase()}@greyfield.example`,
  role,
  active,
  createdAt: '2026-11-01T08:00:00.000Z',
});

const team: TeamAnswer = {
  // The signed-in admin of the fixtures has id 3.
  members: [member(5, 'Ada Keel', 'bench'), member(3, 'Ruth Greyfield', 'admin'), member(7, 'Sam Fitter', 'viewer', false)],
  invitations: [
    {
      id: 9,
      email: 'late@example.com',
      role: 'designer',
      createdAt: '2026-11-20T08:00:00.000Z',
      expiresAt: '2026-11-27T08:00:00.000Z',
      expired: true,
      invitedBy: 'Ruth Greyfield',
    },
  ],
};

describe('TeamPage', () => {
  let fixture: ComponentFixture<TeamPage>;
  let http: HttpTestingController;
  let page: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    await signInAs('admin');
    fixture = TestBed.createComponent(TeamPage);
    page = fixture.nativeElement;
    TestBed.tick();
    http.expectOne('/api/team').flush(team);
    await fixture.whenStable();
  });

  afterEach(() => http.verify());

  const row = (name: string) => [...page.querySelectorAll('tr')].find((r) => r.textContent?.includes(name))!;
  const toggleOf = (name: string) => row(name).querySelector<HTMLButtonElement>('mat-slide-toggle button')!;
  const dialogText = () => document.querySelector('mat-dialog-container')?.textContent ?? '';

  it('lists every member with role and whether they may sign in, and marks oneself', async () => {
    expect([...page.querySelectorAll('td .name')].map((n) => n.textContent)).toEqual(['Ada Keel', 'Ruth Greyfield', 'Sam Fitter']);
    expect(row('Ruth Greyfield').textContent).toContain('(you)');
    expect(toggleOf('Ruth Greyfield').disabled).toBe(true);
    expect(row('Sam Fitter').textContent).toContain('Deactivated');
    expect(page.querySelector('.invitation')?.textContent).toContain('expired on 27 Nov 2026');
    expect(buttonNamed('Send again')).toBeDefined();
  });

  it('asks before deactivating, saying the member is signed out at once; no means nothing is sent', async () => {
    toggleOf('Ada Keel').click();
    await fixture.whenStable();
    expect(dialogText()).toContain('Deactivate Ada Keel?');
    expect(dialogText()).toContain('Ada Keel is signed out everywhere now and can no longer sign in');
    buttonNamed('Cancel')!.click();
    await settle();
    await fixture.whenStable();
    http.expectNone('/api/team/members/5');
    expect(toggleOf('Ada Keel').getAttribute('aria-checked')).toBe('true');

    toggleOf('Ada Keel').click();
    await fixture.whenStable();
    buttonNamed('Deactivate and sign out')!.click();
    await settle();
    const request = http.expectOne({ method: 'PATCH', url: '/api/team/members/5' });
    expect(request.request.body).toEqual({ active: false });
    request.flush({ ...team.members[0], active: false });
    await settle();
    await fixture.whenStable();
    expect(row('Ada Keel').textContent).toContain('Deactivated');
  });

  it('withdraws an invitation after asking', async () => {
    buttonNamed('Withdraw')!.click();
    await fixture.whenStable();
    expect(dialogText()).toContain('The link mailed to late@example.com stops working.');
    const confirm = [...document.querySelectorAll<HTMLButtonElement>('mat-dialog-container button')].find((b) => accessibleName(b) === 'Withdraw');
    confirm!.click();
    await settle();
    http.expectOne({ method: 'DELETE', url: '/api/team/invitations/9' }).flush(null, { status: 204, statusText: 'No Content' });
    await settle();
    await fixture.whenStable();
    expect(page.querySelector('.invitation')).toBeNull();
    expect(page.textContent).toContain('No open invitations.');
  });

  it('asks before changing a role, saying what it lets the member do, says when it is done, and puts the choice back when the server refuses it', async () => {
    const choose = async (member: string, option: string) => {
      row(member).querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
      await fixture.whenStable();
      [...document.querySelectorAll<HTMLElement>('mat-option')].find((o) => o.textContent?.trim() === option)!.click();
      await fixture.whenStable();
    };
    const confirm = async (label: string) => {
      buttonNamed(label)!.click();
      await settle();
    };
    const shown = (member: string) => row(member).querySelector('.mat-mdc-select-value')?.textContent?.trim();

    await choose('Ada Keel', 'Viewer');
    expect(dialogText()).toContain('Make Ada Keel a viewer?');
    expect(dialogText()).toContain('read jobs, drawings and cautions');
    await confirm('Cancel');
    await fixture.whenStable();
    http.expectNone('/api/team/members/5');
    expect(shown('Ada Keel')).toBe('Bench');

    await choose('Ada Keel', 'Designer');
    await confirm('Make designer');
    const request = http.expectOne({ method: 'PATCH', url: '/api/team/members/5' });
    expect(request.request.body).toEqual({ role: 'designer' });
    request.flush({ ...team.members[0], role: 'designer' });
    await settle();
    await fixture.whenStable();
    expect(shown('Ada Keel')).toBe('Designer');
    expect(document.querySelector('mat-snack-bar-container')?.textContent).toContain('Ada Keel is now a designer.');

    await choose('Ada Keel', 'Viewer');
    await confirm('Make viewer');
    http.expectOne('/api/team/members/5').flush(
      { error: { code: 'conflict', message: 'Someone made a conflicting change at the same moment. Reload and try again.' } },
      { status: 409, statusText: 'Conflict' },
    );
    await settle();
    await fixture.whenStable();
    expect(page.querySelector('[role="alert"]')?.textContent).toContain("Ada Keel's role was not changed.");
    expect(shown('Ada Keel')).toBe('Designer');
  });

  it('says why a change was refused and keeps what the server has', async () => {
    toggleOf('Sam Fitter').click();
    await fixture.whenStable();
    http
      .expectOne('/api/team/members/7')
      .flush({ error: { code: 'conflict', message: 'Someone made a conflicting change at the same moment. Reload and try again.' } }, { status: 409, statusText: 'Conflict' });
    await settle();
    await fixture.whenStable();
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('Sam Fitter was not activated. Someone made a conflicting change');
    expect(toggleOf('Sam Fitter').getAttribute('aria-checked')).toBe('false');
  });
});
