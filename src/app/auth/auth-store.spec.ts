import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { aUser, settle } from '../../testing/fixtures';
import { ApiProblem } from '../core/api-problem';
import { errorInterceptor } from '../core/error-interceptor';
import { AuthStore } from './auth-store';

const unauthorized = { status: 401, statusText: 'Unauthorized' };

describe('AuthStore', () => {
  let auth: AuthStore;
  let http: HttpTestingController;

  /** A sign-in first asks who is signed in, which hands out the XSRF token, then posts. */
  async function answerSignIn(answer: object, status = { status: 200, statusText: 'OK' }): Promise<void> {
    http.expectOne('/api/auth/session').flush({ user: null });
    await settle();
    http.expectOne({ method: 'POST', url: '/api/auth/sign-in' }).flush(answer, status);
  }

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    auth = TestBed.inject(AuthStore);
    http = TestBed.inject(HttpTestingController);
  });

  afterEach(() => http.verify());

  it('asks the server once who is signed in', async () => {
    const first = auth.restoreSession();
    const second = auth.restoreSession();
    http.expectOne({ method: 'GET', url: '/api/auth/session' }).flush({ user: aUser('bench') });

    expect(await first).toEqual(aUser('bench'));
    expect(await second).toEqual(aUser('bench'));
    expect(auth.role()).toBe('bench');
    expect(auth.signedIn()).toBe(true);
  });

  it("stores the user's choice of units and follows it at once, millimetres until then", async () => {
    expect(auth.units()).toBe('mm');
    const restoring = auth.restoreSession();
    http.expectOne('/api/auth/session').flush({ user: aUser('bench') });
    await restoring;
    const choosing = auth.chooseUnits('in-64');
    const request = http.expectOne({ method: 'PATCH', url: '/api/auth/me/preferences' });
    expect(request.request.body).toEqual({ units: 'in-64' });
    request.flush({ user: aUser('bench', 'in-64') });
    await choosing;
    expect(auth.units()).toBe('in-64');
  });

  it('takes a 401 from me as nobody signed in', async () => {
    const restoring = auth.restoreSession();
    http.expectOne('/api/auth/session').flush({ user: null });

    expect(await restoring).toBeNull();
    expect(auth.user()).toBeNull();
    expect(auth.can('readJobs')).toBe(false);
  });

  it('refuses an answer that does not match the contract', async () => {
    const restoring = auth.restoreSession();
    http.expectOne('/api/auth/session').flush({ user: { id: 3, email: 'x@y.example', name: 'X', role: 'owner' } });

    expect(await restoring).toBeNull();
  });

  it('fetches the XSRF token, signs in and grants what the role allows', async () => {
    const signingIn = auth.signIn('designer@greyfield.example', 'greyfield-demo');
    http.expectOne('/api/auth/session').flush({ user: null });
    await settle();
    const request = http.expectOne({ method: 'POST', url: '/api/auth/sign-in' });
    expect(request.request.body).toEqual({ email: 'designer@greyfield.example', password: 'greyfield-demo' });
    request.flush({ user: aUser('designer') });

    expect(await signingIn).toEqual(aUser('designer'));
    expect(auth.can('editJobs')).toBe(true);
    expect(auth.can('manageTeam')).toBe(false);
  });

  it('rejects wrong credentials with the 401 as an ApiProblem', async () => {
    const signingIn = auth.signIn('designer@greyfield.example', 'wrong');
    await answerSignIn({ error: { code: 'bad-credentials', message: 'Wrong e-mail or password.' } }, unauthorized);

    const error = await signingIn.catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiProblem);
    expect((error as ApiProblem).status).toBe(401);
    expect(auth.signedIn()).toBe(false);
  });

  it('forgets the user only after the server ended the session, then asks for a new token', async () => {
    const signingIn = auth.signIn('viewer@greyfield.example', 'greyfield-demo');
    await answerSignIn({ user: aUser('viewer') });
    await signingIn;

    const failing = auth.signOut();
    http.expectOne('/api/auth/sign-out').flush(null, { status: 0, statusText: 'Unknown Error' });
    await expect(failing).rejects.toBeInstanceOf(ApiProblem);
    expect(auth.signedIn()).toBe(true);

    const signingOut = auth.signOut();
    http.expectOne({ method: 'POST', url: '/api/auth/sign-out' }).flush(null, { status: 204, statusText: 'No Content' });
    await signingOut;
    expect(auth.signedIn()).toBe(false);

    const restoring = auth.restoreSession();
    http.expectOne('/api/auth/session').flush({ user: null });
    expect(await restoring).toBeNull();
  });
});
