/** A piece of a mail's plain text: words as they are, or an address to link. */
export type MailPiece = { text: string } | { href: string };

// http(s) only: a `javascript:` or `data:` address in a message stays text. A closing bracket
// or a sentence's full stop after an address is not part of it.
const ADDRESS = /https?:\/\/[^\s<>"']+/gi;
const TRAILING = /[.,;:!?)\]}]+$/;

/** The text cut into plain pieces and http(s) addresses, in order; joined they give it back. */
export function mailPieces(text: string): MailPiece[] {
  const pieces: MailPiece[] = [];
  let at = 0;
  for (const match of text.matchAll(ADDRESS)) {
    const href = match[0].replace(TRAILING, '');
    const start = match.index;
    if (start > at) pieces.push({ text: text.slice(at, start) });
    pieces.push({ href });
    at = start + href.length;
  }
  if (at < text.length) pieces.push({ text: text.slice(at) });
  return pieces;
}

/** A message's plain text as the outbox shows it, with every web address a link. */
export function MailBody({ text }: { text: string }) {
  return (
    <pre
      className="mt-2 whitespace-pre-wrap wrap-anywhere text-sm text-stone-800"
      data-testid="outbox-body"
    >
      {mailPieces(text).map((piece, i) =>
        'href' in piece ? (
          <a
            key={i}
            href={piece.href}
            rel="noreferrer"
            className="text-leaf-700 underline"
            data-testid="outbox-link"
          >
            {piece.href}
          </a>
        ) : (
          piece.text
        ),
      )}
    </pre>
  );
}
