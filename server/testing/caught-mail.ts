import { desc } from 'drizzle-orm';
import type { Database } from '../db/client';
import { outbox } from '../db/schema';

export interface CaughtMail {
  id: number;
  subject: string;
  text: string;
  sender: string;
  /** The first link in the text. */
  link: string;
  /** The link's token (its `token` query parameter). */
  token: string;
}

/** Every message the catcher kept for this address, newest first. */
export async function mailsTo(db: Database, address: string): Promise<CaughtMail[]> {
  const rows = await db.select().from(outbox).orderBy(desc(outbox.id));
  return rows
    .filter((row) => row.recipients.includes(address))
    .map((row) => {
      const link = /https?:\/\/\S+/.exec(row.text)?.[0] ?? '';
      return { id: row.id, subject: row.subject, text: row.text, sender: row.sender, link, token: link ? (new URL(link).searchParams.get('token') ?? '') : '' };
    });
}

/**
 * The newest message to this address, waiting for it when it is sent after the answer (a password
 * reset): up to a few seconds, then fails naming the address.
 */
export async function waitForMail(db: Database, address: string, after = 0): Promise<CaughtMail> {
  const until = Date.now() + 5000;
  for (;;) {
    const [latest] = (await mailsTo(db, address)).filter((m) => m.id > after);
    if (latest) return latest;
    if (Date.now() > until) throw new Error(`no mail to ${address} arrived within 5 s`);
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}
