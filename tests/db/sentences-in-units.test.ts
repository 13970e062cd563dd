import { beforeAll, describe, expect, it } from 'vitest';
import { freshDatabase } from '../support/db';
import type { Actor } from '@/lib/auth/actor';
import { runDropCheck } from '@/lib/checks/drop/check';
import { runStackCheck } from '@/lib/checks/stack/check';
import { runSqueezeCheck } from '@/lib/checks/squeeze/check';
import { textIn, type Text } from '@/lib/phrase';

// The sentences the server writes about figures — warnings, the drop's relation, the bruise's
// words — read in US customary units carry no SI unit after a number, and in SI none of the US.
const engineer: Actor = { id: 0, email: 'e@test', name: 'E', role: 'engineer' };
const SI_AFTER_NUMBER = /\d\s?(mm|mm²|mm³|kPa|MPa|kg\/m³|g|N|J|mm³\/J)(?![\w/²³])/;
const US_AFTER_NUMBER = /\d\s?(in|in²|in³|psi|lb\/ft³|oz|lbf|ft·lbf)(?![\w/²³])/;

function sentences(r: { warnings: Text[]; relation?: Text; bruise?: { words: Text } | null }) {
  return [
    ...r.warnings,
    ...(r.relation ? [r.relation] : []),
    ...(r.bruise ? [r.bruise.words] : []),
  ];
}

describe('server sentences follow the reader’s units', () => {
  let all: Text[] = [];
  beforeAll(async () => {
    await freshDatabase();
    const drops = await Promise.all([
      runDropCheck(engineer, { cultivar: 'strawberry-type', heightMm: 100, surface: 'steel' }),
      runDropCheck(engineer, { cultivar: 'peach-type', heightMm: 100, surface: 'belt rubber' }),
      runDropCheck(engineer, {
        cultivar: 'apple-type',
        heightMm: 100,
        surface: 'foam',
        padModulusMpa: 0.5,
        padThicknessMm: 2,
      }),
    ]);
    const stack = await runStackCheck(engineer, {
      cultivar: 'apple-type',
      binLengthMm: 1200,
      binWidthMm: 1000,
      fillDepthMm: 600,
    });
    const squeeze = await runSqueezeCheck(engineer, {
      cultivar: 'apple-type',
      padDiameterMm: 20,
      padEdgeMm: 2,
      holdSeconds: 5,
      gripOffsetMm: 15,
      horizontalAccelerationMs2: 4,
      sweep: false,
    });
    all = [...drops.flatMap(sentences), ...sentences(stack), ...sentences(squeeze)];
  }, 60_000);

  it('has sentences with measures to read (the cases above produce them)', () => {
    expect(all.filter((t) => typeof t !== 'string').length).toBeGreaterThan(8);
  });

  it('in US units no SI unit follows a number, and in SI no US unit does', () => {
    for (const t of all) {
      expect(textIn(t, 'us'), textIn(t, 'us')).not.toMatch(SI_AFTER_NUMBER);
      expect(textIn(t, 'si')).not.toMatch(US_AFTER_NUMBER);
    }
  });
});
