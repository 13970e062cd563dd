import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';

/** The transporter and the settings it was built from; rebuilt when the environment changes. */
let cached: { key: string; transporter: Transporter } | undefined;

/** SMTP settings from the environment; the default is the local catcher started with the app. */
export function smtpSettings() {
  return {
    host: process.env.SMTP_HOST ?? '127.0.0.1',
    port: Number(process.env.SMTP_PORT ?? 2525),
    secure: process.env.SMTP_SECURE === 'true',
    user: process.env.SMTP_USER,
    pass: process.env.SMTP_PASS,
    from: process.env.MAIL_FROM ?? 'Tenderline <no-reply@tenderline.invalid>',
  };
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

/** Send one message over SMTP. Throws when the server refuses or cannot be reached. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  const s = smtpSettings();
  const key = JSON.stringify([s.host, s.port, s.secure, s.user, s.pass]);
  if (cached?.key !== key) {
    cached?.transporter.close();
    const transporter = nodemailer.createTransport({
      host: s.host,
      port: s.port,
      secure: s.secure,
      auth: s.user ? { user: s.user, pass: s.pass } : undefined,
      // The local catcher speaks plain SMTP on loopback.
      ignoreTLS: !s.secure && (s.host === '127.0.0.1' || s.host === 'localhost'),
      connectionTimeout: 5000,
    });
    cached = { key, transporter };
  }
  await cached.transporter.sendMail({ from: s.from, ...mail });
}

/** The public base URL used in links inside e-mails: the app's own origin. */
export { appUrl } from '@/lib/http/origin';
