import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { ForgotPassword } from './forgot-password';

describe('ForgotPassword', () => {
  let fixture: ComponentFixture<ForgotPassword>;
  let http: HttpTestingController;
  let page: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ForgotPassword);
    page = fixture.nativeElement;
    await fixture.whenStable();
  });

  afterEach(() => http.verify());

  function type(value: string): void {
    const input = page.querySelector<HTMLInputElement>('input[formControlName="email"]')!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function submit(): Promise<void> {
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  }

  it('asks for an address, and a well-formed one', async () => {
    await submit();
    expect(page.querySelector('mat-error')?.textContent?.trim()).toBe('Enter the e-mail address you sign in with.');
    type('not-an-address');
    await submit();
    expect(page.querySelector('mat-error')?.textContent?.trim()).toBe('This is not an e-mail address.');
    http.expectNone('/api/auth/password-reset');
  });

  it('shows the server\'s answer, which is the same for any address', async () => {
    type(' sam@example.com ');
    await submit();
    const request = http.expectOne({ method: 'POST', url: '/api/auth/password-reset' });
    expect(request.request.body).toEqual({ email: 'sam@example.com' });
    request.flush({ message: 'If this address belongs to a member of the shop, a link to choose a new password is on its way to it.' }, { status: 202, statusText: 'Accepted' });
    await settle();
    await fixture.whenStable();
    expect(page.querySelector('[role="status"]')?.textContent).toContain('a link to choose a new password is on its way');
    expect(page.querySelector('[role="status"]')?.textContent).toContain('sam@example.com');
    expect(page.querySelector('form')).toBeNull();
  });

  it('asks to wait after too many requests', async () => {
    type('sam@example.com');
    await submit();
    http
      .expectOne('/api/auth/password-reset')
      .flush({ error: { code: 'too-many-attempts', message: 'Too many password reset requests.' } }, { status: 429, statusText: 'Too Many Requests' });
    await settle();
    await fixture.whenStable();
    expect(page.querySelector('[role="alert"]')?.textContent).toContain('Wait an hour');
  });
});
