import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { ResetPassword } from './reset-password';

const TOKEN = 'R'.repeat(43);

describe('ResetPassword', () => {
  let fixture: ComponentFixture<ResetPassword>;
  let http: HttpTestingController;
  let page: HTMLElement;

  async function open(answer: object, status = 200): Promise<void> {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ResetPassword);
    fixture.componentRef.setInput('token', TOKEN);
    page = fixture.nativeElement;
    TestBed.tick();
    http.expectOne(`/api/auth/password-reset/${TOKEN}`).flush(answer, { status, statusText: 'Answer' });
    await settle();
    await fixture.whenStable();
  }

  function type(name: string, value: string): void {
    const input = page.querySelector<HTMLInputElement>(`input[formControlName="${name}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
  }

  const errors = () => [...page.querySelectorAll('mat-error')].map((e) => e.textContent?.trim());

  afterEach(() => http.verify());

  it('asks for the new password twice, alike, and sends it once it is', async () => {
    await open({ email: 'sam@example.com', expiresAt: '2026-12-02T10:00:00.000Z' });
    expect(page.textContent).toContain('sam@example.com');

    type('password', 'a new long password');
    type('repeat', 'a new long passwort');
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
    expect(errors()).toEqual(['The two passwords differ.']);
    http.expectNone(`/api/auth/password-reset/${TOKEN}`);

    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    type('repeat', 'a new long password');
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
    const request = http.expectOne({ method: 'POST', url: `/api/auth/password-reset/${TOKEN}` });
    expect(request.request.body).toEqual({ password: 'a new long password' });
    request.flush(null, { status: 204, statusText: 'No Content' });
    await settle();
    expect(navigate).toHaveBeenCalledWith(['/sign-in'], { queryParams: { passwordChanged: 'true' } });
  });

  it('says a used link was used, offers a new one, and shows no form', async () => {
    await open({ error: { code: 'link-used', message: 'This password reset link has already been used. To change the password again, ask for a new link.' } }, 410);
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('already been used');
    expect(page.querySelector('form')).toBeNull();
    expect([...page.querySelectorAll('a')].map((a) => a.textContent?.trim())).toEqual(['Ask for a new link', 'Back to sign-in']);
  });
});
