// The app's HTTP server: Next behind a thin layer that decides, before Next reads a byte of a
// body, what the request may carry. Run by `npm start`, `npm run demo` and the browser tests.
//   node scripts/server.mjs            listens on the host and port of APP_URL (or PORT/HOST)
// Forwarded headers are dropped unless TRUST_PROXY is set, so Next fills X-Forwarded-For from
// the socket and compares a server action's Origin with the real Host.
import http from 'node:http';
import next from 'next';

const MB = 1024 * 1024;
/** The largest body of any request (uploads); route handlers set tighter limits of their own. */
const MAX_BODY = 12 * MB;
/** Server actions and other posts to pages: Next's own action limit, refused here with a 413. */
const MAX_PAGE_BODY = 1 * MB;
const FORWARDED = ['x-forwarded-for', 'x-forwarded-host', 'x-forwarded-proto', 'x-forwarded-port'];
const BODYLESS = new Set(['GET', 'HEAD', 'OPTIONS']);

const trustProxy = ['1', 'true'].includes(process.env.TRUST_PROXY ?? '');

function refuse(res, status, message) {
  res.writeHead(status, {
    'content-type': 'application/json',
    'cache-control': 'no-store',
    connection: 'close',
  });
  res.end(JSON.stringify({ error: status === 413 ? 'too_large' : 'length_required', message }));
}

/** Refuse a body that is too large, or of unknown length, before it is read. */
function bodyProblem(req) {
  if (BODYLESS.has(req.method ?? 'GET')) return null;
  const limit = (req.url ?? '/').startsWith('/api/') ? MAX_BODY : MAX_PAGE_BODY;
  const declared = req.headers['content-length'];
  if (declared === undefined) {
    if (req.headers['transfer-encoding']) {
      return [411, 'Send the request body with a Content-Length.'];
    }
    return null;
  }
  if (!/^\d+$/.test(declared) || Number(declared) > limit) {
    return [413, `The request body is larger than ${limit / MB} MB.`];
  }
  return null;
}

export async function startServer({ port, hostname, dev = false }) {
  const app = next({ dev, hostname, port });
  const handle = app.getRequestHandler();
  await app.prepare();
  const server = http.createServer((req, res) => {
    if (!trustProxy) for (const name of FORWARDED) delete req.headers[name];
    const problem = bodyProblem(req);
    if (problem) {
      refuse(res, ...problem);
      req.resume();
      return;
    }
    handle(req, res);
  });
  server.headersTimeout = 20_000;
  server.requestTimeout = 60_000;
  await new Promise((resolve) => server.listen(port, hostname, resolve));
  return server;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const url = new URL(process.env.APP_URL ?? process.env.NEXTAUTH_URL ?? 'http://127.0.0.1:3000');
  const port = Number(process.env.PORT ?? (url.port || (url.protocol === 'https:' ? 443 : 80)));
  const hostname = process.env.HOST ?? url.hostname;
  await startServer({ port, hostname });
  console.log(`Tenderline listening on http://${hostname}:${port}`);
}
