import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { aUser, settle } from '../../testing/fixtures';
import { errorInterceptor } from '../core/error-interceptor';
import { SignIn } from './sign-in';

describe('SignIn', () => {
  let fixture: ComponentFixture<SignIn>;
  let http: HttpTestingController;
  let page: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(SignIn);
    page = fixture.nativeElement;
    await fixture.whenStable();
  });

  afterEach(() => http.verify());

  function type(label: string, value: string): void {
    const input = page.querySelector<HTMLInputElement>(`input[formControlName="${label}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  /** The first sign-in of a page also asks who is signed in, for the XSRF token. */
  async function submit(answer: object, status: number, { firstTry = true } = {}): Promise<void> {
    type('email', 'designer@greyfield.example');
    type('password', 'greyfield-demo');
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    if (firstTry) {
      http.expectOne('/api/auth/session').flush({ user: null });
    }
    await settle();
    http.expectOne('/api/auth/sign-in').flush(answer, { status, statusText: 'Answer' });
    await settle();
    await fixture.whenStable();
  }

  it('says what each empty or malformed field needs', async () => {
    type('email', 'not-an-address');
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();

    const errors = [...page.querySelectorAll('mat-error')].map((e) => e.textContent?.trim());
    expect(errors).toEqual(['This is not an e-mail address.', 'Enter your password.']);
  });

  it('says plainly when the e-mail and password do not match', async () => {
    await submit({ error: { code: 'bad-credentials', message: 'Wrong e-mail or password.' } }, 401);

    expect(page.querySelector('[role="alert"]')?.textContent).toContain('That e-mail address and password do not match an account.');
  });

  it('says how long to wait after too many tries, in the server’s words', async () => {
    await submit({ error: { code: 'sign-in-wait', message: 'Too many sign-in attempts in a short time. Wait 4 seconds and try again.' } }, 429);

    expect(page.querySelector('[role="alert"]')?.textContent).toContain('Wait 4 seconds and try again.');
  });

  it('goes where the guard was sending the user, and never off the site', async () => {
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    fixture.componentRef.setInput('returnUrl', '/jobs/11');
    await submit({ user: aUser('designer') }, 200);
    expect(navigate).toHaveBeenLastCalledWith('/jobs/11');

    fixture.componentRef.setInput('returnUrl', '//elsewhere.example/jobs');
    await submit({ user: aUser('designer') }, 200, { firstTry: false });
    expect(navigate).toHaveBeenLastCalledWith('/jobs');
  });
});
