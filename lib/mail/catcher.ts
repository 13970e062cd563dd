import { createHash, timingSafeEqual } from 'node:crypto';
import type { Knex } from 'knex';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer, type SMTPServerOptions } from 'smtp-server';

function addresses(a: AddressObject | AddressObject[] | undefined): string {
  if (!a) return '';
  return (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ');
}

/** Compare digests so neither the length nor the first differing byte shows in the timing. */
function sameSecret(given: string | null | undefined, expected: string): boolean {
  const digest = (value: string) => createHash('sha256').update(value, 'utf8').digest();
  return timingSafeEqual(digest(given ?? ''), digest(expected));
}

export interface CatcherCredentials {
  user: string;
  pass: string;
}

/** With credentials, only a client that logs in (PLAIN or LOGIN) may hand over mail. */
function authOptions(credentials?: CatcherCredentials): Partial<SMTPServerOptions> {
  if (!credentials) return { authOptional: true };
  return {
    authOptional: false,
    authMethods: ['PLAIN', 'LOGIN'],
    // No TLS on the loopback catcher, so AUTH has to be allowed over plain SMTP.
    allowInsecureAuth: true,
    onAuth(auth, _session, callback) {
      const userOk = sameSecret(auth.username, credentials.user);
      const passOk = sameSecret(auth.password, credentials.pass);
      if (userOk && passOk) return callback(null, { user: credentials.user });
      return callback(
        Object.assign(new Error('Invalid username or password'), { responseCode: 535 }),
      );
    },
    onMailFrom(_address, session, callback) {
      if (!session.user) {
        return callback(Object.assign(new Error('Authentication required'), { responseCode: 530 }));
      }
      return callback();
    },
  };
}

/**
 * A local SMTP server that stores each message it accepts in mail_outbox. It stands in for the
 * site's mail provider in the demo and in tests. Port 0 picks a free port. Given credentials it
 * requires SMTP AUTH, so other local processes cannot fill the outbox.
 */
export async function startMailCatcher(
  knex: Knex,
  port = 2525,
  host = '127.0.0.1',
  credentials?: CatcherCredentials,
): Promise<{ port: number; close: () => Promise<void> }> {
  const server = new SMTPServer({
    ...authOptions(credentials),
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) =>
          knex('mail_outbox').insert({
            message_id: mail.messageId ?? null,
            from_address: addresses(mail.from),
            to_addresses: addresses(mail.to),
            subject: mail.subject ?? '(no subject)',
            text_body: mail.text ?? '',
            html_body: typeof mail.html === 'string' ? mail.html : null,
            received_at: new Date(),
          }),
        )
        .then(() => callback())
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const address = server.server.address();
  const actualPort = typeof address === 'object' && address ? address.port : port;
  return {
    port: actualPort,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
