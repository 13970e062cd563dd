/**
 * Plain-text views of an article body for search and checks. The MDX is only scanned here, never
 * evaluated: headings split it into sections, and components are reduced to their text.
 */

/** The anchor id of a heading; the page's heading components use the same function. */
export function headingId(text: string): string {
  return text
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
}

export interface ArticleSection {
  id: string;
  heading: string;
  /** The H2 a level-3 section sits under, for "Along the line › Packing". */
  parent: string | null;
  text: string;
}

/** Markdown and MDX reduced to readable words (tags, math, link targets and markup dropped). */
export function plainText(markdown: string): string {
  return markdown
    .replace(/\$\$[\s\S]*?\$\$/g, ' ')
    .replace(/\$[^$\n]+\$/g, ' ')
    .replace(/<\/?[A-Za-z][^>]*>/g, ' ')
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/^\|?[\s:|-]+\|[\s:|-]*$/gm, ' ')
    .replace(/[|*_`>#]/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();
}

/** The body split at its level-2 and level-3 headings (text before the first one is the lead). */
export function splitSections(body: string): ArticleSection[] {
  const out: ArticleSection[] = [];
  let current: ArticleSection = { id: '', heading: '', parent: null, text: '' };
  let h2: string | null = null;
  const flush = () => {
    current.text = plainText(current.text);
    if (current.heading || current.text) out.push(current);
  };
  for (const line of body.split('\n')) {
    const match = /^(##|###)\s+(.+?)\s*#*\s*$/.exec(line);
    if (!match) {
      current.text += `${line}\n`;
      continue;
    }
    flush();
    const heading = match[2];
    if (match[1] === '##') h2 = heading;
    current = {
      id: headingId(heading),
      heading,
      parent: match[1] === '###' ? h2 : null,
      text: '',
    };
  }
  flush();
  return out;
}

const attribute = (tag: string, name: string) =>
  new RegExp(`<${tag}\\b[^>]*\\b${name}=["']([^"']+)["']`, 'g');

function collect(body: string, pattern: RegExp): string[] {
  return [...new Set([...body.matchAll(pattern)].map((m) => m[1]))];
}

/** Source keys cited inline with `<SourceRef id="…" />`, in order of first use. */
export function inlineSourceKeys(body: string): string[] {
  return collect(body, attribute('SourceRef', 'id'));
}

/** Cultivar slugs named by `<LiveValues cultivar="…" />`. */
export function cardCultivars(body: string): string[] {
  return collect(body, attribute('LiveValues', 'cultivar'));
}

/** The level-2 headings, in order. */
export function topHeadings(body: string): string[] {
  return [...body.matchAll(/^##\s+(.+?)\s*$/gm)].map((m) => m[1]);
}
