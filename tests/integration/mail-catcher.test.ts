import net from 'node:net';
import nodemailer from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { countRows, freshDatabase } from '../support/db';
import { startTestCatcher, waitForMail } from '../support/mail';
import { sendMail } from '@/lib/mail/send';

/** Speak SMTP by hand: send each line after the previous reply, return every reply code. */
async function rawSmtp(port: number, lines: string[]): Promise<number[]> {
  const socket = net.connect(port, '127.0.0.1');
  const codes: number[] = [];
  let buffer = '';
  const queue = [...lines];
  return new Promise((resolve, reject) => {
    socket.setTimeout(5000, () => reject(new Error('SMTP timeout')));
    socket.on('error', reject);
    socket.on('data', (chunk) => {
      buffer += chunk.toString('utf8');
      // A reply is complete on a line "NNN text" (a dash after the code means more lines follow).
      const done = buffer.split('\r\n').filter((line) => /^\d{3} /.test(line));
      if (done.length === 0) return;
      codes.push(...done.map((line) => Number(line.slice(0, 3))));
      buffer = '';
      const next = queue.shift();
      if (next === undefined) {
        socket.end();
        resolve(codes);
      } else socket.write(`${next}\r\n`);
    });
  });
}

describe('the mail catcher accepts mail only from a client that logs in', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
  });
  afterAll(() => catcher.close());

  it('refuses MAIL FROM without AUTH (530) and stores nothing', async () => {
    const before = await countRows('mail_outbox');
    const codes = await rawSmtp(catcher.port, [
      'EHLO intruder.example',
      'MAIL FROM:<spam@intruder.example>',
      'QUIT',
    ]);
    expect(codes).toEqual([220, 250, 530, 221]);
    expect(await countRows('mail_outbox')).toBe(before);
  });

  it('refuses a nodemailer client without credentials or with a wrong password', async () => {
    const before = await countRows('mail_outbox');
    const message = { from: 'a@intruder.example', to: 'b@x.example', subject: 'hi', text: 'x' };
    const base = { host: '127.0.0.1', port: catcher.port, ignoreTLS: true };
    await expect(nodemailer.createTransport(base).sendMail(message)).rejects.toMatchObject({
      responseCode: 530,
    });
    const wrong = { user: catcher.credentials.user, pass: 'not-the-password' };
    await expect(
      nodemailer.createTransport({ ...base, auth: wrong }).sendMail(message),
    ).rejects.toMatchObject({ responseCode: 535 });
    expect(await countRows('mail_outbox')).toBe(before);
  });

  it("stores a message sent with the app's credentials (AUTH PLAIN and LOGIN)", async () => {
    await sendMail({ to: 'plain@guest.example', subject: 'Plain', text: 'Sent by the app.' });
    expect((await waitForMail('plain@guest.example')).text_body).toContain('Sent by the app.');
    const login = nodemailer.createTransport({
      host: '127.0.0.1',
      port: catcher.port,
      ignoreTLS: true,
      auth: { ...catcher.credentials, method: 'LOGIN' },
    } as nodemailer.TransportOptions);
    await login.sendMail({ from: 'app@tenderline.invalid', to: 'login@guest.example', text: 'y' });
    await waitForMail('login@guest.example');
  });

  it('rebuilds the app transporter when the SMTP settings change', async () => {
    const pass = process.env.SMTP_PASS;
    process.env.SMTP_PASS = 'changed-and-wrong';
    try {
      await expect(
        sendMail({ to: 'nobody@guest.example', subject: 'x', text: 'x' }),
      ).rejects.toThrow();
    } finally {
      process.env.SMTP_PASS = pass;
    }
    await sendMail({ to: 'again@guest.example', subject: 'Again', text: 'Back to the right one.' });
    await waitForMail('again@guest.example');
  });
});
