import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { PendingInvitation } from '../../../shared/api/team-contract';
import { settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { InviteForm } from './invite-form';
import { TeamStore } from './team-store';

const sent: PendingInvitation = {
  id: 5,
  email: 'nia@example.com',
  role: 'bench',
  createdAt: '2026-12-02T09:00:00.000Z',
  expiresAt: '2026-12-09T09:00:00.000Z',
  expired: false,
  invitedBy: 'Ruth Greyfield',
};

describe('InviteForm', () => {
  let fixture: ComponentFixture<InviteForm>;
  let http: HttpTestingController;
  let page: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [TeamStore, provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(InviteForm);
    page = fixture.nativeElement;
    TestBed.tick();
    http.expectOne('/api/team').flush({ members: [], invitations: [] });
    await fixture.whenStable();
  });

  afterEach(() => http.verify());

  function type(name: string, value: string): void {
    const input = page.querySelector<HTMLInputElement>(`input[formControlName="${name}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function submit(): Promise<void> {
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  }

  const errors = () => [...page.querySelectorAll('mat-error')].map((e) => e.textContent?.trim());

  it('asks for a well-formed address, and starts new members as viewers, saying what that allows', async () => {
    expect(page.querySelector('mat-hint')?.textContent).toContain('May read jobs, drawings and cautions; nothing else.');
    await submit();
    expect(errors()).toEqual(['Enter the e-mail address.']);
    type('email', 'nia at example');
    type('name', '   ');
    await submit();
    expect(errors()).toEqual(['This is not an e-mail address.', 'The name must not be blank.']);
    http.expectNone('/api/team/invitations');
  });

  it('sends the invitation, says until when its link works, and clears the form', async () => {
    type('email', ' nia@example.com ');
    type('name', ' Nia ');
    await submit();
    const request = http.expectOne({ method: 'POST', url: '/api/team/invitations' });
    expect(request.request.body).toEqual({ email: 'nia@example.com', role: 'viewer', name: 'Nia' });
    request.flush({ ...sent, role: 'viewer' }, { status: 201, statusText: 'Created' });
    await settle();
    await fixture.whenStable();
    expect(page.querySelector('[role="status"]')?.textContent).toContain('Invitation sent to nia@example.com as viewer. The link works until 9 Dec 2026');
    expect(page.querySelector<HTMLInputElement>('input[formControlName="email"]')!.value).toBe('');
    expect(errors()).toEqual([]);
  });

  it('puts the server\'s refusal of a member\'s address under the address', async () => {
    type('email', 'designer@greyfield.example');
    await submit();
    http
      .expectOne('/api/team/invitations')
      .flush(
        { error: { code: 'already-member', message: 'designer@greyfield.example is already a member of the shop.', fields: { email: 'is already a member of the shop' } } },
        { status: 409, statusText: 'Conflict' },
      );
    await settle();
    await fixture.whenStable();
    expect(errors()).toEqual(['The e-mail address is already a member of the shop.']);
  });
});
