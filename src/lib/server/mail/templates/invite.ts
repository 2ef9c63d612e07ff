import { frame } from '../layout';
import type { Message } from '../index';

export function inviteMessage(to: string, inviterName: string, link: string, expiresAt: Date, roles: string[]): Message {
  const body = frame(
    'You are invited to Phosforge',
    [
      `${inviterName} invited you to Phosforge with the role(s): ${roles.join(', ')}.`,
      `Open the link below to choose your name and password. The link works once and ` +
        `expires ${expiresAt.toISOString().slice(0, 16).replace('T', ' ')} UTC.`
    ],
    { href: link, label: 'Accept the invitation' }
  );
  return { to: [to], subject: 'Your Phosforge invitation', ...body };
}
