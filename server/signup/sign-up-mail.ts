import type { OutgoingMail } from '../mail/mailer';

const hours = (ms: number) => Math.round(ms / 3_600_000);

/** The link that makes the shop, for a new address. */
export function confirmShopMail(input: { to: string; name: string; shopName: string; link: string; lifetimeMs: number }): OutgoingMail {
  const lifetime = hours(input.lifetimeMs);
  const lines = [
    `Hello ${input.name},`,
    '',
    `Someone asked Borewright to open a shop called "${input.shopName}" with ${input.to} as its admin.`,
    '',
    `If it was you, open this link within ${lifetime} hour${lifetime === 1 ? '' : 's'} to confirm the address. The shop is made then, and the link works once:`,
    input.link,
    '',
    'If you did not ask for this, ignore this mail: no shop is made unless the link is opened.',
  ];
  return { fromName: 'Borewright', to: [input.to], subject: 'Confirm your new Borewright shop', text: lines.join('\n') };
}

/** For an address that already has an account: nothing is made, and its owner learns someone tried. */
export function addressInUseMail(input: { to: string; signInLink: string; resetLink: string }): OutgoingMail {
  const lines = [
    `Someone tried to open a new Borewright shop with ${input.to}, which already belongs to a Borewright account. No shop was made.`,
    '',
    'If it was you, sign in with this address:',
    input.signInLink,
    '',
    'or, if the password is forgotten, ask for a new one:',
    input.resetLink,
    '',
    'If it was not you, nothing needs doing: your account stays as it is.',
  ];
  return { fromName: 'Borewright', to: [input.to], subject: 'Someone tried to open a Borewright shop with your address', text: lines.join('\n') };
}
