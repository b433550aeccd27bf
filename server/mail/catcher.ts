import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import type { Database } from '../db/client';
import type { Logger } from '../logger';
import { inShop } from '../db/shop-scope';
import { insertOutboxMessage } from './outbox.repository';
import { parseMail } from './parse-mail';

/** The largest message the catcher takes: a pack goes attached up to 10 MB, which base64 makes about 14. */
const MAX_MESSAGE_BYTES = 32 * 1024 * 1024;

export interface Catcher {
  port: number;
  close(): Promise<void>;
}

async function readAll(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer));
  return Buffer.concat(chunks);
}

/** Which shop's outbox a caught message goes to: set by our own mailer (mailer.ts), read only here. */
export const SHOP_HEADER = 'X-Borewright-Shop';

/**
 * The local mail catcher (design.md §5): an SMTP server on 127.0.0.1 that keeps every message it receives
 * in the outbox table instead of delivering it. Plain SMTP only, without STARTTLS or AUTH: it answers on
 * the loopback address alone. A message is acknowledged only once it is stored, so a send that succeeded
 * is already in the outbox.
 */
export function startCatcher(db: Database, logger: Logger): Promise<Catcher> {
  const server = new SMTPServer({
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    size: MAX_MESSAGE_BYTES,
    logger: false,
    banner: 'Borewright mail catcher',
    onData(stream, session, callback) {
      readAll(stream)
        .then(async (raw) => {
          if (stream.sizeExceeded) throw Object.assign(new Error('The message is too large.'), { responseCode: 552 });
          const mail = await parseMail(raw);
          const shop = Number(mail.headers.get(SHOP_HEADER.toLowerCase()) ?? '');
          if (!Number.isSafeInteger(shop) || shop <= 0) {
            // Mail sent before its shop exists (a sign-up's confirmation link) has no outbox to go to: on a
            // developer's machine, the server's log is where it can be read.
            logger.warn({ to: session.envelope.rcptTo.map((r) => r.address), subject: mail.subject, text: mail.text }, 'the local mail catcher kept no copy of a message sent before its shop exists; its text is here');
            return;
          }
          await inShop(shop, () => insertOutboxMessage(db, {
            sender: mail.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
            recipients: session.envelope.rcptTo.map((r) => r.address),
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            attachments: mail.attachments.map((a) => ({ name: a.filename ?? 'attachment', contentType: a.contentType, bytes: a.size })),
            raw,
          }));
        })
        .then(
          () => callback(),
          (err: Error) => {
            logger.error({ err }, 'the mail catcher could not keep a message');
            callback(err);
          },
        );
    },
  });
  return new Promise((resolve, reject) => {
    server.server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.server.address() as AddressInfo;
      resolve({ port, close: () => new Promise((done) => server.close(() => done())) });
    });
  });
}
