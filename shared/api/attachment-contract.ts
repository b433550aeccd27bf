import * as z from 'zod';
import { dbId } from './contract';

/**
 * Job attachments: photos and PDFs kept with a job. The type is the one the content was found to be,
 * never the name's or the one the browser claimed.
 */
export const ATTACHMENT_TYPES = {
  'image/png': 'PNG image',
  'image/jpeg': 'JPEG image',
  'image/webp': 'WebP image',
  'application/pdf': 'PDF document',
} as const;
export type AttachmentType = keyof typeof ATTACHMENT_TYPES;

export const attachmentParams = z.object({ attachmentId: dbId });

export const attachmentSummary = z.object({
  id: z.number().int(),
  jobId: z.number().int(),
  filename: z.string(),
  contentType: z.enum(Object.keys(ATTACHMENT_TYPES) as [AttachmentType, ...AttachmentType[]]),
  size: z.number().int(),
  /** Who uploaded it; null once that account is gone. */
  uploadedBy: z.string().nullable(),
  uploadedAt: z.string(),
});
export type AttachmentSummary = z.output<typeof attachmentSummary>;

export const attachmentList = z.object({
  attachments: z.array(attachmentSummary),
  /** The largest file an upload takes, so that the page can say so before anyone tries. */
  maxBytes: z.number().int(),
});
export type AttachmentList = z.output<typeof attachmentList>;
