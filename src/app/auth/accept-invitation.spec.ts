import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { aUser, settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { AcceptInvitation } from './accept-invitation';
import { AuthStore } from './auth-store';

const TOKEN = 'T'.repeat(43);
const invitation = { email: 'nia@example.com', role: 'bench', expiresAt: '2026-12-09T09:00:00.000Z' };

describe('AcceptInvitation', () => {
  let fixture: ComponentFixture<AcceptInvitation>;
  let http: HttpTestingController;
  let page: HTMLElement;

  async function open(answer: object, status = 200): Promise<void> {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(AcceptInvitation);
    fixture.componentRef.setInput('token', TOKEN);
    page = fixture.nativeElement;
    TestBed.tick();
    http.expectOne(`/api/invitations/${TOKEN}`).flush(answer, { status, statusText: 'Answer' });
    await settle();
    await fixture.whenStable();
  }

  function type(selector: string, value: string): void {
    const input = page.querySelector<HTMLInputElement>(selector)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
  }

  const errors = () => [...page.querySelectorAll('mat-error')].map((e) => e.textContent?.trim());
  const submit = async () => {
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  };

  afterEach(() => http.verify());

  it('shows the address and the role the invitation grants, and what the role may do', async () => {
    await open(invitation);
    expect(page.querySelector('.email')?.textContent).toBe('nia@example.com');
    expect(page.querySelector('.role')?.textContent).toBe('bench');
    expect(page.textContent).toContain('May read jobs, download and print packs and templates, mark panels drilled or checked.');
  });

  it('says what each field needs: a name, a long enough password, the same one twice', async () => {
    await open(invitation);
    await submit();
    expect(errors()).toEqual(['Enter your name.', 'Choose a password.', 'Type the password again.']);

    type('input[formControlName="name"]', '   ');
    type('input[formControlName="password"]', 'short');
    type('input[formControlName="repeat"]', 'shorter');
    await fixture.whenStable();
    expect(errors()).toEqual(['The name must not be blank.', 'Use at least 8 characters.', 'The two passwords differ.']);

    type('input[formControlName="password"]', 'é'.repeat(37));
    await fixture.whenStable();
    expect(errors()).toContain('This is too long: at most 72 bytes (72 plain letters, fewer with accents).');
  });

  it('makes the member, adopts the session the server started, and opens the jobs', async () => {
    await open(invitation);
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    type('input[formControlName="name"]', ' Nia Holt ');
    type('input[formControlName="password"]', 'a long new password');
    type('input[formControlName="repeat"]', 'a long new password');
    await submit();

    const request = http.expectOne({ method: 'POST', url: `/api/invitations/${TOKEN}/accept` });
    expect(request.request.body).toEqual({ name: 'Nia Holt', password: 'a long new password' });
    request.flush({ user: aUser('bench') }, { status: 201, statusText: 'Created' });
    await settle();
    expect(TestBed.inject(AuthStore).role()).toBe('bench');
    expect(navigate).toHaveBeenCalledWith('/jobs');
  });

  it('says plainly that an expired link has expired, and shows no form', async () => {
    await open({ error: { code: 'link-expired', message: 'This invitation expired on 2026-12-09. Ask an admin of your shop to invite you again.' } }, 410);
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('This invitation expired on 2026-12-09. Ask an admin of your shop to invite you again.');
    expect(page.querySelector('form')).toBeNull();
    expect(page.querySelector('a')?.textContent?.trim()).toBe('Go to sign-in');
  });

  it('sends someone whose link was used already to sign in', async () => {
    await open({ error: { code: 'link-used', message: 'This invitation has already been accepted. Sign in with the e-mail address and the password chosen then.' } }, 410);
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('already been accepted');
    expect(page.querySelector('a')?.textContent?.trim()).toBe('Sign in');
  });

  it('says so when the link dies while the form is open', async () => {
    await open(invitation);
    type('input[formControlName="name"]', 'Nia Holt');
    type('input[formControlName="password"]', 'a long new password');
    type('input[formControlName="repeat"]', 'a long new password');
    await submit();
    http
      .expectOne(`/api/invitations/${TOKEN}/accept`)
      .flush({ error: { code: 'link-unknown', message: 'This invitation link is not valid: it was withdrawn.' } }, { status: 404, statusText: 'Not Found' });
    await settle();
    await fixture.whenStable();
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('it was withdrawn');
    expect(page.querySelector('form')).toBeNull();
  });
});
