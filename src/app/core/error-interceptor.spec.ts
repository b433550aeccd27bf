import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { signInAs } from '../../testing/fixtures';
import { AuthStore } from '../auth/auth-store';
import { ApiProblem, describeError } from './api-problem';
import { errorInterceptor } from './error-interceptor';

describe('errorInterceptor', () => {
  let client: HttpClient;
  let http: HttpTestingController;
  let router: Router;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    client = TestBed.inject(HttpClient);
    http = TestBed.inject(HttpTestingController);
    router = TestBed.inject(Router);
  });

  afterEach(() => http.verify());

  async function failure(url: string, body: string | object, status: number): Promise<ApiProblem> {
    const answer = firstValueFrom(client.get(url)).catch((e: unknown) => e);
    http.expectOne(url).flush(body, { status, statusText: 'Failed' });
    const error = await answer;
    expect(error).toBeInstanceOf(ApiProblem);
    return error as ApiProblem;
  }

  it('keeps the message, field messages and document details of an API error', async () => {
    const problem = await failure(
      '/api/jobs/import',
      {
        error: {
          code: 'invalid-document',
          message: 'The job document has 2 problems.',
          fields: { name: 'must not be empty' },
          details: ['panels[0].width: must be greater than 0', 'panels[1].material: no material with id "oak"'],
        },
      },
      400,
    );

    expect(problem.status).toBe(400);
    expect(problem.code).toBe('invalid-document');
    expect(problem.message).toBe('The job document has 2 problems.');
    expect(problem.fields).toEqual({ name: 'must not be empty' });
    expect(problem.details).toEqual([
      'panels[0].width: must be greater than 0',
      'panels[1].material: no material with id "oak"',
    ]);
  });

  it('words an answer without the error shape by its status', async () => {
    const problem = await failure('/api/jobs', '<html>Bad gateway</html>', 502);

    expect(problem.code).toBe('unreadable-answer');
    expect(describeError(problem)).toBe(
      'The server ran into a problem (status 502). Try again; if it keeps happening, tell your admin.',
    );
  });

  it('sends the user to sign-in when the session has ended', async () => {
    await signInAs('designer');
    const navigate = vi.spyOn(router, 'navigate').mockResolvedValue(true);

    await failure('/api/jobs/11', { error: { code: 'unauthenticated', message: 'Not signed in.' } }, 401);

    expect(TestBed.inject(AuthStore).signedIn()).toBe(false);
    expect(navigate).toHaveBeenCalledWith(['/sign-in'], { queryParams: { returnUrl: '/' } });
  });

  it('leaves a 401 from sign-in to the sign-in page', async () => {
    const navigate = vi.spyOn(router, 'navigate');

    await failure('/api/auth/sign-in', { error: { code: 'bad-credentials', message: 'Wrong e-mail or password.' } }, 401);

    expect(navigate).not.toHaveBeenCalled();
  });
});
