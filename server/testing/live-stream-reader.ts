import type { Test } from 'supertest';
import { DEMO_PASSWORD } from '../demo/greyfield-people';
import { XSRF_COOKIE, XSRF_HEADER } from '../auth/csrf';
import type { LiveEvent, LiveEventKind } from '../../shared/api/live-contract';

/**
 * A browser's side of a live stream for tests: a member signed in over plain HTTP to a listening
 * server (fetch keeps no cookies, so this keeps them), and a reader of server-sent events.
 */
export class HttpMember {
  constructor(
    readonly base: string,
    private readonly cookies = new Map<string, string>(),
  ) {}

  /** The same member, the same session, through another server. */
  at(base: string): HttpMember {
    return new HttpMember(base, this.cookies);
  }

  private keep(res: Response): Response {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const at = pair.indexOf('=');
      this.cookies.set(pair.slice(0, at), pair.slice(at + 1));
    }
    return res;
  }

  get cookie(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  async fetch(path: string, init: { method?: string; body?: unknown; headers?: Record<string, string> } = {}): Promise<Response> {
    const token = this.cookies.get(XSRF_COOKIE);
    const headers: Record<string, string> = { cookie: this.cookie, ...init.headers };
    if (init.method && init.method !== 'GET' && token) headers[XSRF_HEADER] = decodeURIComponent(token);
    if (init.body !== undefined) headers['content-type'] = 'application/json';
    return this.keep(await fetch(`${this.base}${path}`, { method: init.method, headers, body: init.body === undefined ? undefined : JSON.stringify(init.body) }));
  }

  async json<T>(path: string, init?: Parameters<HttpMember['fetch']>[1]): Promise<T> {
    const res = await this.fetch(path, init);
    if (!res.ok) throw new Error(`${init?.method ?? 'GET'} ${path} answered ${res.status}: ${await res.text()}`);
    return (res.status === 204 ? undefined : await res.json()) as T;
  }

  static async signIn(base: string, email: string): Promise<HttpMember> {
    const member = new HttpMember(base);
    // Read to its end: express-session stores the new session (and its XSRF token) before the answer's
    // last byte, so a sign-in sent on the headers alone can arrive before it and be refused.
    await (await member.fetch('/api/auth/me')).arrayBuffer();
    await member.json('/api/auth/sign-in', { method: 'POST', body: { email, password: DEMO_PASSWORD } });
    return member;
  }

  /** Opens the job's stream (the server answers its headers before this resolves). */
  async stream(path: string, lastEventId?: number): Promise<LiveReader> {
    const controller = new AbortController();
    const res = await fetch(`${this.base}${path}`, {
      headers: { cookie: this.cookie, accept: 'text/event-stream', ...(lastEventId === undefined ? {} : { 'Last-Event-ID': String(lastEventId) }) },
      signal: controller.signal,
    });
    return new LiveReader(res, controller);
  }
}

/** The events of one open stream, as they arrive; `next` waits for the first that matches. */
export class LiveReader {
  readonly events: LiveEvent[] = [];
  /** When each event arrived (performance.now()), for the bench's delay from a save to its event. */
  readonly arrivals = new Map<LiveEvent, number>();
  readonly comments: string[] = [];
  private waiters: (() => void)[] = [];
  private closed = false;

  constructor(
    readonly response: Response,
    private readonly controller: AbortController,
  ) {
    if (response.ok && response.body) void this.read(response.body);
  }

  private async read(body: ReadableStream<Uint8Array>): Promise<void> {
    const decoder = new TextDecoder();
    let buffer = '';
    try {
      for await (const chunk of body) {
        buffer += decoder.decode(chunk, { stream: true });
        let end: number;
        while ((end = buffer.indexOf('\n\n')) >= 0) {
          this.take(buffer.slice(0, end));
          buffer = buffer.slice(end + 2);
        }
      }
    } catch {
      // Aborted by close().
    }
    this.closed = true;
    this.wake();
  }

  private take(block: string): void {
    const fields: Record<string, string> = {};
    for (const line of block.split('\n')) {
      if (line.startsWith(':')) this.comments.push(line.slice(1).trim());
      const at = line.indexOf(':');
      if (at > 0) fields[line.slice(0, at)] = line.slice(at + 1).trimStart();
    }
    if (fields.event && fields.data) {
      const event = { id: Number(fields.id), kind: fields.event, data: JSON.parse(fields.data) } as LiveEvent;
      this.events.push(event);
      this.arrivals.set(event, performance.now());
    }
    this.wake();
  }

  private wake(): void {
    const waiting = this.waiters;
    this.waiters = [];
    waiting.forEach((w) => w());
  }

  /** Whether the server ended the stream. */
  get ended(): boolean {
    return this.closed;
  }

  /** The first event of this kind that matches, waiting for it up to `ms`. */
  async next<K extends LiveEventKind>(kind: K, match: (event: Extract<LiveEvent, { kind: K }>) => boolean = () => true, ms = 10_000): Promise<Extract<LiveEvent, { kind: K }>> {
    const deadline = Date.now() + ms;
    for (;;) {
      const found = this.events.find((e): e is Extract<LiveEvent, { kind: K }> => e.kind === kind && match(e as Extract<LiveEvent, { kind: K }>));
      if (found) return found;
      if (this.closed) throw new Error(`the stream ended before a ${kind} event came`);
      const left = deadline - Date.now();
      if (left <= 0) throw new Error(`no ${kind} event within ${ms} ms; got ${JSON.stringify(this.events.map((e) => e.kind))}`);
      await new Promise<void>((resolve) => {
        const timer = setTimeout(resolve, left);
        this.waiters.push(() => (clearTimeout(timer), resolve()));
      });
    }
  }

  /** Waits until the server ends the stream. */
  async untilEnded(ms = 10_000): Promise<void> {
    const deadline = Date.now() + ms;
    while (!this.closed) {
      if (Date.now() > deadline) throw new Error('the stream did not end');
      await new Promise<void>((resolve) => {
        const timer = setTimeout(resolve, deadline - Date.now());
        this.waiters.push(() => (clearTimeout(timer), resolve()));
      });
    }
  }

  close(): void {
    this.controller.abort();
  }
}

/** A supertest request to a stream, answered as soon as its headers and first bytes arrive (the role matrix). */
export function firstBytes(test: Test): Test {
  return test.buffer(true).parse((res, done) => {
    let answered = false;
    const answer = () => {
      if (!answered) done(null, '');
      answered = true;
    };
    res.once('data', () => {
      answer();
      // The stream never ends by itself: drop the connection, as a closed tab would.
      (res as unknown as { destroy(): void }).destroy();
    });
    res.once('end', answer);
  });
}
