import { XSRF_COOKIE, XSRF_HEADER } from '../server/auth/csrf';
import { DEMO_PASSWORD } from '../server/demo/greyfield-people';

/** A browser's view of the API over fetch: one cookie jar, the XSRF token echoed on writes. */
export class ApiSession {
  private cookies = new Map<string, string>();
  constructor(private readonly base: string) {}

  /** The Cookie header a browser of this session would send. */
  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  async request(method: string, url: string, body?: unknown): Promise<{ status: number; body: any }> {
    const headers: Record<string, string> = { cookie: this.cookieHeader() };
    const token = this.cookies.get(XSRF_COOKIE);
    if (method !== 'GET' && token) headers[XSRF_HEADER] = decodeURIComponent(token);
    const form = body instanceof FormData;
    if (body !== undefined && !form) headers['content-type'] = 'application/json';
    const res = await fetch(`${this.base}${url}`, { method, headers, body: body === undefined ? undefined : form ? body : JSON.stringify(body) });
    for (const cookie of res.headers.getSetCookie()) {
      const [pair] = cookie.split(';');
      const at = pair.indexOf('=');
      this.cookies.set(pair.slice(0, at), pair.slice(at + 1));
    }
    const text = await res.text();
    return { status: res.status, body: text.startsWith('{') ? JSON.parse(text) : text };
  }

  /** Signs in as a demo member. */
  async signIn(email: string): Promise<void> {
    await this.request('GET', '/api/auth/me');
    const res = await this.request('POST', '/api/auth/sign-in', { email, password: DEMO_PASSWORD });
    if (res.status !== 200) throw new Error(`sign-in answered ${res.status}: ${JSON.stringify(res.body)}`);
  }
}
