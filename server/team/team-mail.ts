import { ROLE_DUTIES } from '../../shared/api/team-contract';
import type { Role } from '../../shared/api/contract';
import type { OutgoingMail } from '../mail/mailer';

const day = (at: Date) => at.toISOString().slice(0, 10);
const minutes = (ms: number) => Math.round(ms / 60_000);

/** The invitation: who invites, the role and what it allows, the link and until when it works. */
export function invitationMail(input: { to: string; name?: string; role: Role; inviter: { name: string; email: string }; link: string; expiresAt: Date }): OutgoingMail {
  const article = input.role === 'admin' ? 'an' : 'a';
  const lines = [
    `Hello${input.name ? ` ${input.name}` : ''},`,
    '',
    `${input.inviter.name} invites you to the shop's Borewright as ${article} ${input.role}: ${ROLE_DUTIES[input.role]}.`,
    '',
    `Open this link to choose your name and password. It works once, until ${day(input.expiresAt)}:`,
    input.link,
    '',
    'If you did not expect this invitation, ignore this mail: nothing happens unless the link is opened.',
  ];
  return {
    fromName: `${input.inviter.name} via Borewright`,
    replyTo: input.inviter.email,
    to: [input.to],
    subject: `${input.inviter.name} invites you to Borewright`,
    text: lines.join('\n'),
  };
}

/** The reset link, for the member's own address only. */
export function passwordResetMail(input: { to: string; link: string; lifetimeMs: number }): OutgoingMail {
  const lines = [
    `Someone asked to reset the password of the Borewright account for ${input.to}.`,
    '',
    `If it was you, open this link within ${minutes(input.lifetimeMs)} minutes and choose a new password. It works once:`,
    input.link,
    '',
    'Once the password is changed, every other session of this account is signed out.',
    'If you did not ask for this, ignore this mail: your password stays as it is.',
  ];
  return { fromName: 'Borewright', to: [input.to], subject: 'Reset your Borewright password', text: lines.join('\n') };
}
