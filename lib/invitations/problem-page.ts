import { createHash } from 'node:crypto';
import { STANDING_CAUTION } from '@/lib/cautions';
import { PROBLEM_MESSAGES, PROBLEM_STATUS, type InvitationProblem } from './messages';

/**
 * A page cannot answer 410 in the App Router (notFound/forbidden/unauthorized give 404/403/401
 * only), so the link's route handler answers with this small self-contained page instead: the
 * same words and look as the sign-in card, with the honest status.
 */
const STYLE = [
  'body{margin:0;font-family:system-ui,sans-serif;background:#f2f7f1;color:#1c1917}',
  'main{min-height:100vh;display:flex;flex-direction:column;align-items:center;justify-content:center;padding:48px 16px;box-sizing:border-box}',
  '.card{width:100%;max-width:24rem;box-sizing:border-box;background:#fff;border:1px solid #e7e5e4;border-radius:12px;padding:24px;box-shadow:0 1px 2px rgb(0 0 0/.05)}',
  '.brand{margin:0 0 4px;font-size:20px;font-weight:600;color:#1b3619}',
  'h1{margin:0 0 12px;font-size:16px;font-weight:600}',
  'p.msg{margin:0 0 12px;font-size:14px;line-height:20px;color:#44403c}',
  'a{font-size:14px;color:#2f5f2c}',
  '.caution{margin-top:24px;max-width:28rem;text-align:center;font-size:12px;line-height:16px;color:#78716c}',
].join('');

const STYLE_HASH = createHash('sha256').update(STYLE).digest('base64');

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' };
const escape = (text: string) => text.replace(/[&<>"]/g, (c) => ESCAPES[c]);

function documentFor(problem: InvitationProblem, nonce: string | null): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>Invitation · Tenderline</title>
<style${nonce ? ` nonce="${escape(nonce)}"` : ''}>${STYLE}</style>
</head>
<body>
<main>
<div class="card" data-testid="invitation-problem" data-state="${problem}">
<p class="brand">Tenderline</p>
<h1>Invitation</h1>
<p class="msg">${escape(PROBLEM_MESSAGES[problem])}</p>
<a href="/sign-in">Sign in</a>
</div>
<p class="caution">${escape(STANDING_CAUTION)}</p>
</main>
</body>
</html>
`;
}

/**
 * The problem page with its status: 404 for an unknown link, 410 for one that has ended. The
 * style carries the request's CSP nonce when the proxy issued one, and its hash in any case.
 */
export function problemResponse(problem: InvitationProblem, nonce: string | null = null): Response {
  return new Response(documentFor(problem, nonce), {
    status: PROBLEM_STATUS[problem],
    headers: {
      'Content-Type': 'text/html; charset=utf-8',
      'Content-Security-Policy': `default-src 'none'; style-src 'sha256-${STYLE_HASH}'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'`,
      'Referrer-Policy': 'no-referrer',
      'X-Robots-Tag': 'noindex',
    },
  });
}
