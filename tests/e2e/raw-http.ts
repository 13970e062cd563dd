import http from 'node:http';

export const APP = new URL(`http://127.0.0.1:${Number(process.env.E2E_PORT ?? 3100)}`);

export interface RawResponse {
  status: number;
  headers: http.IncomingHttpHeaders;
  body: string;
}

/**
 * One HTTP request to the app with full control over what goes on the wire: the local address
 * it comes from (Linux routes all of 127.0.0.0/8 to loopback), the headers, and a body that may
 * be shorter than the Content-Length it declares.
 */
export function rawRequest(options: {
  method: string;
  path: string;
  headers?: Record<string, string>;
  body?: string | Buffer;
  localAddress?: string;
}): Promise<RawResponse> {
  return new Promise((resolve, reject) => {
    const req = http.request(
      {
        host: APP.hostname,
        port: APP.port,
        method: options.method,
        path: options.path,
        headers: options.headers,
        localAddress: options.localAddress,
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () =>
          resolve({
            status: res.statusCode ?? 0,
            headers: res.headers,
            body: Buffer.concat(chunks).toString('utf8'),
          }),
        );
      },
    );
    req.on('error', (error: NodeJS.ErrnoException) => {
      // The server may close the socket after answering early (413); the answer still counts.
      if (error.code !== 'EPIPE' && error.code !== 'ECONNRESET') reject(error);
    });
    if (options.body !== undefined) req.write(options.body);
    req.end();
  });
}

/** The Set-Cookie pairs of a response as one Cookie header. */
export function cookieHeader(headers: http.IncomingHttpHeaders, previous = ''): string {
  const pairs = (headers['set-cookie'] ?? []).map((c) => c.split(';')[0]);
  return [previous, ...pairs].filter(Boolean).join('; ');
}

/** A credentials sign-in attempt as the sign-in page would send it, from a given address. */
export async function postSignIn(email: string, password: string, localAddress: string) {
  const csrf = await rawRequest({ method: 'GET', path: '/api/auth/csrf', localAddress });
  const { csrfToken } = JSON.parse(csrf.body) as { csrfToken: string };
  const body = new URLSearchParams({ email, password, csrfToken, json: 'true' }).toString();
  return rawRequest({
    method: 'POST',
    path: '/api/auth/callback/credentials',
    localAddress,
    headers: {
      'content-type': 'application/x-www-form-urlencoded',
      'content-length': String(Buffer.byteLength(body)),
      origin: APP.origin,
      cookie: cookieHeader(csrf.headers),
    },
    body,
  });
}

/**
 * Write raw bytes on a TCP connection (a request head, then as much of a body as we like) and
 * read the status the server answers with, without ever sending the rest.
 */
export async function rawStatus(head: string, partialBody: Buffer | string): Promise<number> {
  const net = await import('node:net');
  return new Promise((resolve, reject) => {
    const socket = net.connect(Number(APP.port), APP.hostname, () => {
      socket.write(head);
      socket.write(partialBody);
    });
    let text = '';
    socket.on('data', (chunk) => {
      text += chunk.toString('latin1');
      const match = text.match(/^HTTP\/1\.1 (\d{3})/);
      if (match) {
        socket.destroy();
        resolve(Number(match[1]));
      }
    });
    socket.on('error', reject);
    socket.setTimeout(15_000, () => {
      socket.destroy();
      reject(new Error('no answer within 15 s'));
    });
  });
}
