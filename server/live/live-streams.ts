import { randomUUID } from 'node:crypto';
import type { Request, Response } from 'express';
import type { LiveEvent, PresentMember } from '../../shared/api/live-contract';
import { sessionSignedInAs } from '../auth/sessions.repository';
import type { Database } from '../db/client';
import { inShop, requireShop } from '../db/shop-scope';
import type { JobEvents } from './job-events';
import { eventsAfter, joinPresence, lastEventId, leavePresence, touchPresence } from './job-events.repository';

/** A comment line this often keeps proxies from closing a quiet stream, and moves the presence row on. */
export const HEARTBEAT_MS = 25_000;
/** What a browser's EventSource waits before reconnecting. */
const RETRY_MS = 2000;

interface OpenStream {
  sid: string;
  end(): Promise<void>;
}

/**
 * The live streams open on this server: each one sends its job's events from the log, after the
 * id it was asked to resume from, whenever JobEvents says there may be more. Ends them all at
 * shutdown, and a session's at its sign-out; a session ended on another server is noticed at the
 * next heartbeat.
 */
export class LiveStreams {
  private readonly open = new Set<OpenStream>();

  constructor(
    private readonly db: Database,
    private readonly jobEvents: JobEvents,
    private readonly heartbeatMs = HEARTBEAT_MS,
  ) {}

  /** Answers the request with the job's stream until the browser, the session or the server ends it. */
  async stream(req: Request, res: Response, jobId: number, panelId: number | null, resumeFrom: number | undefined): Promise<void> {
    const user = req.user!;
    const member: PresentMember = { id: user.id, name: user.name, panelId };
    const stream = randomUUID();
    // A notification (from the listening connection), the browser going and shutdown all call back outside
    // this request: what they read and write is this shop's, so they run in its scope, never across shops.
    const shopId = requireShop();
    let sent = resumeFrom ?? (await lastEventId(this.db, jobId));
    let pumping = Promise.resolve();
    let ended = false;
    const write = (event: LiveEvent) => res.write(`id: ${event.id}\nevent: ${event.kind}\ndata: ${JSON.stringify(event.data)}\n\n`);
    // One read at a time, each from where the last one stopped: notifications may come in bursts.
    const pump = () => {
      pumping = pumping.then(async () => {
        if (ended) return;
        for (const event of await inShop(shopId, () => eventsAfter(this.db, jobId, sent))) {
          write(event);
          sent = event.id;
        }
      }).catch((err: unknown) => req.log.warn({ err }, 'reading job events failed'));
    };

    // Listening first: when it cannot start, the request still answers with an error of its own.
    const unsubscribe = await this.jobEvents.subscribe(jobId, pump);
    res.writeHead(200, { 'Content-Type': 'text/event-stream; charset=utf-8', 'X-Accel-Buffering': 'no' });
    res.write(`retry: ${RETRY_MS}\n\n`);
    pump();

    const heartbeat = setInterval(() => {
      void (async () => {
        if (!(await sessionSignedInAs(this.db, req.sessionID, user.id))) return void (await open.end());
        res.write(': heartbeat\n\n');
        await touchPresence(this.db, stream);
      })().catch((err: unknown) => req.log.warn({ err }, 'live stream heartbeat failed'));
    }, this.heartbeatMs);

    let ending: Promise<void> | undefined;
    const open: OpenStream = {
      sid: req.sessionID,
      end: () =>
        (ending ??= (async () => {
          ended = true;
          clearInterval(heartbeat);
          unsubscribe();
          this.open.delete(open);
          res.end();
          await pumping;
          await inShop(shopId, () => leavePresence(this.db, stream, jobId, member)).catch((err: unknown) => req.log.warn({ err }, 'leaving presence failed'));
        })()),
    };
    this.open.add(open);
    try {
      await joinPresence(this.db, stream, jobId, member);
    } catch (err) {
      req.log.warn({ err }, 'joining presence failed');
      await open.end();
      return;
    }
    // Watched only once joined, so that a leave never comes before its join; the browser may have gone meanwhile.
    res.on('close', () => void open.end());
    if (res.closed) void open.end();
  }

  /** Ends the streams of a session that signed out here. */
  async endSession(sid: string): Promise<void> {
    await Promise.all([...this.open].filter((s) => s.sid === sid).map((s) => s.end()));
  }

  /** Ends every stream (shutdown), each leaving its presence first. */
  async close(): Promise<void> {
    await Promise.all([...this.open].map((s) => s.end()));
  }
}
