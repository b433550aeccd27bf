import type { Express } from 'express';
import request, { type Agent, type Response, type Test } from 'supertest';
import { DEMO_PASSWORD } from '../demo/greyfield-people';
import { XSRF_COOKIE, XSRF_HEADER } from '../auth/csrf';

/**
 * A browser's view of the API in a test: one cookie jar, and the XSRF token echoed on every
 * mutating request as Angular's HttpClient does.
 */
export class ApiClient {
  readonly agent: Agent;
  private token?: string;

  constructor(app: Express) {
    this.agent = request.agent(app);
  }

  /** The token the server last handed out in the XSRF-TOKEN cookie. */
  get xsrfToken(): string | undefined {
    return this.token;
  }

  /** Keeps the token of any answer that hands one out, as the browser keeps the cookie. */
  private track(test: Test): Test {
    test.on('response', (res: Response) => {
      const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
      const xsrf = cookies.find((c) => c.startsWith(`${XSRF_COOKIE}=`));
      if (xsrf) this.token = decodeURIComponent(xsrf.slice(XSRF_COOKIE.length + 1).split(';')[0]);
    });
    return test;
  }

  /** GET /api/auth/me, as the app does on load: starts a session and collects its XSRF token. */
  me(): Test {
    return this.get('/api/auth/me');
  }

  /** Signs in (with the demo password unless told otherwise), collecting a token first when it has none. */
  async signIn(email: string, password = DEMO_PASSWORD): Promise<Response> {
    if (!this.token) await this.me();
    return this.post('/api/auth/sign-in').send({ email, password });
  }

  get(url: string): Test {
    return this.track(this.agent.get(url));
  }

  /** Mutating requests echo the token in the header, as Angular's HttpClient does. */
  private mutate(test: Test): Test {
    return this.track(this.token ? test.set(XSRF_HEADER, this.token) : test);
  }

  post(url: string): Test {
    return this.mutate(this.agent.post(url));
  }

  put(url: string): Test {
    return this.mutate(this.agent.put(url));
  }

  patch(url: string): Test {
    return this.mutate(this.agent.patch(url));
  }

  delete(url: string): Test {
    return this.mutate(this.agent.delete(url));
  }
}

/** A client already signed in to the demo account of this address. */
export async function signedIn(app: Express, email: string): Promise<ApiClient> {
  const client = new ApiClient(app);
  const res = await client.signIn(email);
  if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}: ${JSON.stringify(res.body)}`);
  return client;
}
