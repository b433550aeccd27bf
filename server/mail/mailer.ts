import nodemailer from 'nodemailer';
import type { Config } from '../config';
import type { Database } from '../db/client';
import type { Logger } from '../logger';
import { currentShop } from '../db/shop-scope';
import { SHOP_HEADER, startCatcher } from './catcher';

/** A message as the features write it; the mailer adds the shop's sender address. */
export interface OutgoingMail {
  /** Shown before the sender address, e.g. "Tomas Ward via Borewright". */
  fromName: string;
  /** Where replies go: the person who sent it, not the server's address. */
  replyTo?: string;
  to: string[];
  subject: string;
  text: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export interface Mailer {
  /** Resolves once the mail server has accepted the message (with the catcher: once it is in the outbox). */
  send(mail: OutgoingMail): Promise<void>;
}

export interface MailService {
  mailer: Mailer;
  /** Where mail goes, for the start-up lines: the catcher's port, or the mail server's host. */
  describe: string;
  close(): Promise<void>;
}

/**
 * Mail as configured (design.md §5): with SMTP_URL, a real mail server; without it, the local catcher is
 * started on a free port of 127.0.0.1 and nodemailer talks plain SMTP to it (no TLS on the loopback).
 */
export async function startMail(config: Pick<Config, 'smtpUrl' | 'mailFrom'>, db: Database, logger: Logger): Promise<MailService> {
  const catcher = config.smtpUrl ? undefined : await startCatcher(db, logger);
  const transport = catcher ? nodemailer.createTransport({ host: '127.0.0.1', port: catcher.port, secure: false, ignoreTLS: true }) : nodemailer.createTransport(config.smtpUrl);
  const mailer: Mailer = {
    async send({ fromName, ...mail }) {
      // The catcher keeps each message in the outbox of the shop whose work sent it.
      const headers = catcher ? { [SHOP_HEADER]: String(currentShop() ?? '') } : undefined;
      await transport.sendMail({ ...mail, headers, from: { name: fromName, address: config.mailFrom } });
    },
  };
  return {
    mailer,
    describe: catcher ? `the local catcher on 127.0.0.1:${catcher.port} (read it on the Outbox page)` : `${new URL(config.smtpUrl!).host} (SMTP_URL)`,
    close: async () => {
      transport.close();
      await catcher?.close();
    },
  };
}
