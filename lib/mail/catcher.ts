import type { Knex } from 'knex';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';

function addresses(a: AddressObject | AddressObject[] | undefined): string {
  if (!a) return '';
  return (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ');
}

/**
 * A local SMTP server that accepts every message on loopback and stores it in mail_outbox.
 * It stands in for the site's mail provider in the demo and in tests. Port 0 picks a free port.
 */
export async function startMailCatcher(
  knex: Knex,
  port = 2525,
  host = '127.0.0.1',
): Promise<{ port: number; close: () => Promise<void> }> {
  const server = new SMTPServer({
    authOptional: true,
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
