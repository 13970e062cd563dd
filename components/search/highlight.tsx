import type { Range } from '@/lib/search/types';

/** Text with its matched stretches in <mark>; ranges come from the server, the text is never HTML. */
export function Highlight({ text, ranges }: { text: string; ranges: Range[] }) {
  const sorted = [...ranges].sort((a, b) => a[0] - b[0]);
  const parts: { text: string; marked: boolean }[] = [];
  let at = 0;
  for (const [start, end] of sorted) {
    if (start < at || end >= text.length) continue;
    if (start > at) parts.push({ text: text.slice(at, start), marked: false });
    parts.push({ text: text.slice(start, end + 1), marked: true });
    at = end + 1;
  }
  if (at < text.length) parts.push({ text: text.slice(at), marked: false });
  return (
    <>
      {parts.map((p, i) =>
        p.marked ? (
          <mark key={i} className="rounded-sm bg-amber-200 px-px text-inherit">
            {p.text}
          </mark>
        ) : (
          <span key={i}>{p.text}</span>
        ),
      )}
    </>
  );
}
