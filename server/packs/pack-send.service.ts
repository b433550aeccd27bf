import type { Readable } from 'node:stream';
import type { z } from 'zod';
import type { User } from '../../shared/api/contract';
import type { PackSent, packSendBody } from '../../shared/api/pack-contract';
import { PAPER } from '../../shared/export/paper';
import { recordActivity } from '../activity/activity.repository';
import type { RouteContext } from '../http/route-context';
import { requireShop } from '../db/shop-scope';
import { PACK_LINK_DAYS, signPackLink } from './pack-links';
import { jobPackOrder } from './packs.service';

const megabytes = (bytes: number) => `${(bytes / 1e6).toFixed(1)} MB`;

/** The zip's bytes when it is at most `limit` long; undefined, and the zipping stopped, as soon as it is longer. */
async function zipUpTo(zip: Readable, limit: number): Promise<Buffer | undefined> {
  const chunks: Buffer[] = [];
  let size = 0;
  // Leaving the loop destroys the stream, which stops the worker making the pack.
  for await (const chunk of zip) {
    size += (chunk as Buffer).length;
    if (size > limit) return undefined;
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks);
}

/**
 * Sends a job's bench pack by mail: attached when the zip is at most the configured size (10 MB), otherwise
 * as a signed link that works for a week without signing in. Every send is written to the activity log.
 */
export async function sendPack(context: RouteContext, actor: User, jobId: number, body: z.output<typeof packSendBody>, origin: string): Promise<PackSent> {
  const date = context.clock();
  const order = await jobPackOrder(context.db, jobId, body.paper, date, origin, 'mm');
  const making = context.packPool.make(order);
  const { root, errors } = await making.planned;
  const fileName = `${root}.zip`;
  const jobName = order.job.name;
  const zip = await zipUpTo(making.zip, context.config.packAttachLimitBytes);
  const expiresAt = new Date(date.getTime() + PACK_LINK_DAYS * 86_400_000);
  const link = zip ? undefined : `${origin}/api/pack-links/${signPackLink(context.sessionSecret, { shopId: requireShop(), jobId, paper: body.paper, expiresAt: expiresAt.getTime() })}`;

  const lines = [
    `${actor.name} sent you the bench pack of “${jobName}”, with the template sheets on ${PAPER[body.paper].name}.`,
    ...(body.message ? ['', body.message] : []),
    '',
    zip
      ? `The pack is attached: ${fileName} (${megabytes(zip.length)}).`
      : `The pack is too large to attach. Download it here until ${expiresAt.toISOString().slice(0, 10)}; it is made from the job as it is when you download it:\n${link}`,
    ...(errors > 0 ? ['', `The checks found ${errors} error${errors === 1 ? '' : 's'} in this job; the cover sheet says so. Do not drill what they concern until it is put right.`] : []),
    '',
    'Before drilling from a printed template, check the 100 mm bar on every page.',
  ];
  await context.mailer.send({
    fromName: `${actor.name} via Borewright`,
    replyTo: actor.email,
    to: body.to,
    subject: `Bench pack: ${jobName}`,
    text: lines.join('\n'),
    attachments: zip ? [{ filename: fileName, content: zip, contentType: 'application/zip' }] : [],
  });

  const sent: PackSent = zip
    ? { to: body.to, delivery: 'attached', bytes: zip.length }
    : { to: body.to, delivery: 'link', expiresAt: expiresAt.toISOString() };
  await recordActivity(context.db, { userId: actor.id, jobId, action: 'pack.sent', details: { ...sent, paper: body.paper } });
  return sent;
}
