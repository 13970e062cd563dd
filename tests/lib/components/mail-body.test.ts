import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { MailBody, mailPieces } from '@/components/admin/mail-body';

const INVITATION = [
  'Mara Oduya has invited you to Tenderline as a buyer.',
  '',
  'Open this link within 7 days to set your password:',
  'http://tenderline.test/invite/AbC_d-9xYz',
  '',
  'If you did not expect this, ignore it.',
].join('\n');

describe('outbox mail body', () => {
  it('makes the invitation link a link, the rest plain text', () => {
    const html = renderToStaticMarkup(createElement(MailBody, { text: INVITATION }));
    expect(html).toContain(
      '<a href="http://tenderline.test/invite/AbC_d-9xYz" rel="noreferrer" class="text-leaf-700 underline" data-testid="outbox-link">http://tenderline.test/invite/AbC_d-9xYz</a>',
    );
    expect(html.match(/<a /g)).toHaveLength(1);
    expect(html).toContain('Open this link within 7 days to set your password:\n');
  });

  it('keeps every character of the text, in order', () => {
    const pieces = mailPieces(INVITATION);
    const joined = pieces.map((p) => ('href' in p ? p.href : p.text)).join('');
    expect(joined).toBe(INVITATION);
  });

  it('leaves a full stop or bracket after an address out of the link', () => {
    expect(mailPieces('See https://a.example/x. Or (https://b.example/y).')).toEqual([
      { text: 'See ' },
      { href: 'https://a.example/x' },
      { text: '. Or (' },
      { href: 'https://b.example/y' },
      { text: ').' },
    ]);
  });

  it('never links an address that is not http(s)', () => {
    const text = 'javascript:alert(1) data:text/html,x ftp://files.example/a';
    expect(mailPieces(text)).toEqual([{ text }]);
    const html = renderToStaticMarkup(createElement(MailBody, { text }));
    expect(html).not.toContain('<a ');
  });

  it('escapes markup in a message instead of rendering it', () => {
    const html = renderToStaticMarkup(
      createElement(MailBody, { text: 'Name: <img src=x onerror=alert(1)> https://ok.example' }),
    );
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toContain('href="https://ok.example"');
  });
});
