import { createElement } from 'react';
import { beforeAll, describe, expect, it } from 'vitest';
import '../support/session';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import { renderHtml } from '../lib/atlas/render-html';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor } from '@/lib/data/users';
import { createDraft, publishRevision, submitDraft, updateDraft } from '@/lib/data/revisions';
import { findArticle } from '@/lib/atlas/articles';
import { renderArticle } from '@/components/atlas/render-article';
import { LiveValues } from '@/components/atlas/live-values';

const SLUG = 'apple-jonathan';
let buyer: Actor, editor: Actor, editor2: Actor;

const card = (who: Actor) => renderHtml(createElement(LiveValues, { actor: who, cultivar: SLUG }));
/** The text of a rendered card, without tags, for reading it as a person would. */
const text = (html: string) =>
  html
    .replace(/<[^>]+>/g, ' ')
    .replace(/&#x27;/g, "'")
    .replace(/&amp;/g, '&')
    .replace(/\s+/g, ' ');

describe('LiveValues', () => {
  beforeAll(async () => {
    await freshDatabase();
    const actor = async (email: string) => (await getActiveActor(await userId(email)))!;
    buyer = await actor(ACCOUNTS.buyer);
    editor = await actor(ACCOUNTS.editor);
    editor2 = await actor('editor2@kestrelvale.example');
  });

  it("shows Jonathan's published values with units, spreads and short citations", async () => {
    const shown = text(await card(buyer));
    // Shahabasi (1979): Jonathan flesh modulus 3.28 → 2.52 → 2.36 MPa and failure stress
    // 444 → 252 → 235 kPa over a storage season; the card shows mid-season with the range.
    expect(shown).toContain("Young's modulus (flesh) 2.52 MPa (2.36–3.28) (Shahabasi, 1979)");
    expect(shown).toContain('Tissue failure stress 252 kPa (235–444) (Shahabasi, 1979)');
    expect(shown).toContain('Revision 1');
    for (const missing of [
      'Density',
      'Static bruise threshold',
      'Drop bruise threshold (height)',
    ]) {
      expect(shown).toContain(`${missing} no published value`);
    }
    expect(await card(buyer)).toContain('href="/properties/apple-jonathan"');
  });

  it('shows the new values once a new revision is published by a second editor', async () => {
    const { id } = await createDraft(editor, SLUG, 'Late-season flesh modulus');
    await updateDraft(editor, id, {
      summary: 'Late-season flesh modulus',
      values: [
        {
          quantity: 'youngs_modulus',
          variant: 'flesh',
          value: 2.36,
          method: 'Flesh cylinders in compression',
          storage: '31 Dec',
          sourceKey: 'shahabasi-1979',
        },
        { quantity: 'density', value: 825, sourceKey: 'mohsenin-1986' },
      ],
    });
    await submitDraft(editor, id);
    expect(text(await card(buyer))).toContain('2.52 MPa'); // in review: still revision 1
    await publishRevision(editor2, id);

    const shown = text(await card(buyer));
    expect(shown).toContain('Revision 2');
    expect(shown).toContain("Young's modulus (flesh) 2.36 MPa (Shahabasi, 1979)");
    expect(shown).toContain('Density 825 kg/m³ (Mohsenin, 1986)');
    expect(shown).not.toContain('2.52 MPa');
    expect(shown).toContain('Tissue failure stress no published value');
  });

  it("the apple article's card shows the same new values", async () => {
    const article = findArticle('apple', { includeDrafts: false })!;
    const { content } = await renderArticle(buyer, article);
    const shown = text(await renderHtml(content));
    expect(shown).toContain("Young's modulus (flesh) 2.36 MPa (Shahabasi, 1979)");
    expect(shown).not.toContain('2.52 MPa (2.36–3.28)');
  });
});
