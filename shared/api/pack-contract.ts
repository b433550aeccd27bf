import * as z from 'zod';
import { text } from '../model/well-formed-text';
import { finding } from '../checks/finding';
import { dbId } from './contract';

/**
 * The bench pack's part of the HTTP API: downloads, sending by mail, and the outbox of the local mail
 * catcher. Shared by the server (which validates what comes in) and the client (which validates answers).
 */

/** The paper the template sheets are tiled onto; A4 unless asked. */
export const paperQuery = z.object({ paper: z.enum(['a4', 'letter'], 'must be "a4" or "letter"').default('a4') });

/**
 * The bench pack's download: the paper, and a ticket the client makes up to follow the pack's progress
 * at /api/pack-progress/:ticket while it downloads.
 */
export const packQuery = paperQuery.extend({
  progress: z.string().regex(/^[A-Za-z0-9_-]{16,64}$/, 'must be 16 to 64 letters, digits, "-" or "_"').optional(),
});

/** How often a client asks /api/pack-progress/:ticket how far the pack has got, while it downloads. */
export const PROGRESS_POLL_MS = 500;

/** A pack being made: the panel whose files are being made (0 while the cover and lists are), of how many. */
export const packProgress = z.object({ panel: z.number().int(), panels: z.number().int() });
export type PackProgressAnswer = z.output<typeof packProgress>;

/** Which face's drilling map: A always exists, B when the panel has face B bores. */
export const drillingMapQuery = z.object({ face: z.enum(['A', 'B'], 'must be "A" or "B"').default('A') });

/** The most addresses one send may name: a shop's whole team and a few outside people. */
export const MAX_RECIPIENTS = 20;

/** One address a pack goes to; the send dialog checks each as it is typed, by the same rule. */
export const recipientAddress = z.string().trim().toLowerCase().email('must be an e-mail address').max(254);

export const packSendBody = z.object({
  to: z
    .array(recipientAddress, 'must be a list of e-mail addresses')
    .min(1, 'must name at least one recipient')
    .max(MAX_RECIPIENTS, `must name at most ${MAX_RECIPIENTS} recipients`)
    .transform((to) => [...new Set(to)]),
  paper: paperQuery.shape.paper,
  message: text.trim().max(2000, 'must be at most 2000 characters').optional(),
});
export type PackSendBody = z.input<typeof packSendBody>;

/** How a pack went out: attached to the message, or as a link that expires. */
export const packSent = z.object({
  to: z.array(z.string()),
  delivery: z.enum(['attached', 'link']),
  /** The zip's size; only when attached (a link's pack is made when it is downloaded). */
  bytes: z.number().int().optional(),
  /** When the link stops working; only for a link. */
  expiresAt: z.string().optional(),
});
export type PackSent = z.output<typeof packSent>;

/** The checks' findings of a job, counted by severity, worst first. */
export const jobFindings = z.object({
  errors: z.number().int(),
  warnings: z.number().int(),
  notes: z.number().int(),
  findings: z.array(finding),
});
export type JobFindings = z.output<typeof jobFindings>;

/** Someone a pack can be sent to without typing the address: the shop's people. */
export const mailRecipients = z.object({ people: z.array(z.object({ name: z.string(), email: z.string() })) });
export type MailRecipient = z.output<typeof mailRecipients>['people'][number];

export const outboxAttachment = z.object({ name: z.string(), contentType: z.string(), bytes: z.number().int() });

/** One message the local mail catcher received. */
export const outboxMessage = z.object({
  id: z.number().int(),
  at: z.string(),
  sender: z.string(),
  recipients: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  attachments: z.array(outboxAttachment),
});
export type OutboxMessage = z.output<typeof outboxMessage>;
export const outboxList = z.object({ messages: z.array(outboxMessage) });

export const outboxAttachmentParams = z.object({
  id: dbId,
  index: z.string().regex(/^[0-9]{1,3}$/, 'must be a whole number').transform(Number),
});
