import type { ParsedMail } from 'mailparser';

/**
 * A raw message read as its parts. mailparser, with its character sets and HTML tools, loads with the
 * first message rather than at every start of the server.
 */
export async function parseMail(raw: Buffer | string): Promise<ParsedMail> {
  const { simpleParser } = await import('mailparser');
  return simpleParser(raw);
}
