import { randomBytes } from 'node:crypto';
import { db } from '@/lib/db';
import { startMailCatcher } from '@/lib/mail/catcher';

/**
 * The real catcher on a free loopback port, requiring SMTP AUTH with random credentials; the
 * app's SMTP settings point at it and log in with them.
 */
export async function startTestCatcher() {
  const credentials = {
    user: `tenderline-${randomBytes(4).toString('hex')}`,
    pass: randomBytes(24).toString('base64url'),
  };
  const catcher = await startMailCatcher(db, 0, '127.0.0.1', credentials);
  process.env.SMTP_HOST = '127.0.0.1';
  process.env.SMTP_PORT = String(catcher.port);
  process.env.SMTP_USER = credentials.user;
  process.env.SMTP_PASS = credentials.pass;
  return { ...catcher, credentials };
}

/** Wait until the catcher has stored a message to this address (SMTP finishes before the insert). */
export async function waitForMail(to: string, timeoutMs = 5000) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const row = await db('mail_outbox')
      .where('to_addresses', 'like', `%${to}%`)
      .orderBy('id', 'desc')
      .first();
    if (row)
      return row as {
        subject: string;
        text_body: string;
        from_address: string;
        to_addresses: string;
      };
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
}

export function linkIn(text: string): { link: string; token: string } {
  const match = text.match(/https?:\/\/\S+\/invite\/([A-Za-z0-9_-]+)/);
  if (!match) throw new Error('no invitation link in the message');
  return { link: match[0], token: match[1] };
}
