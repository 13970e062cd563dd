import fs from 'node:fs';
// First: the session stand-in must be in place before any module that reads the session loads.
import '../support/session';
import { describe, expect, it } from 'vitest';
import { PELEG, pelegCsv } from '../support/peleg-curve';
import { BAD_RELAXATION_FILES } from '../lib/lab-tests/relaxation-cases';
import { db } from '@/lib/db';
import {
  as,
  FIELDS,
  ids,
  prepareUploadTests,
  SLUG,
  storedState,
  upload,
} from './relaxation-tests-support';

const GOOD = pelegCsv({ ...PELEG, noise: 0.05, seed: 1 });
const DEMO = fs.readFileSync('public/samples/relaxation-demo.csv');

describe('relaxation-test uploads', () => {
  prepareUploadTests();

  it("answers Peleg's k₁ and k₂ of a noisy generated curve within 5 % and 1 %", async () => {
    // The curve is made from k₁ = 8 s, k₂ = 1.6, F₀ = 30 N with ±0.05 N noise; the tolerances are
    // argued in tests/lib/lab-tests/relaxation-fit.test.ts (F₀'s noise moves k₁ by ≈1 %).
    as('editor');
    const { status, body } = await upload(GOOD);
    expect(status).toBe(201);
    expect(Math.abs(body.test.fit.k1 / 8 - 1)).toBeLessThan(0.05);
    expect(Math.abs(body.test.fit.k2 / 1.6 - 1)).toBeLessThan(0.01);
    // F₀ is the first reading: 30 N ± the 0.05 N noise.
    expect(Math.abs(body.test.fit.f0 - 30)).toBeLessThanOrEqual(0.05);
    expect(body.test.isDemo).toBe(false);
  });

  it('stores the file under an app-made key with its row and one audit row', async () => {
    as('editor');
    const before = await storedState();
    const { body } = await upload(GOOD, {
      ...FIELDS,
      specimen: 'flesh cylinder between flat plates',
      loadingRate: '20 mm/min',
      temperatureC: '21.5',
    });
    const after = await storedState();
    const row = await db('relaxation_tests').where({ id: body.test.id }).first();
    const cultivar = await db('cultivars').where({ slug: SLUG }).first();
    expect(row.storage_key).toMatch(
      new RegExp(`^relaxation-tests/${cultivar.id}/[0-9a-f-]{36}\\.csv$`),
    );
    expect([row.file_name, row.rows, row.uploaded_by]).toEqual(['relax.csv', 241, ids.editor]);
    expect([row.deformation_mm, row.specimen, row.loading_rate, row.temperature_c]).toEqual([
      5,
      'flesh cylinder between flat plates',
      '20 mm/min',
      21.5,
    ]);
    expect([row.k1_s, row.k2, row.f0_n]).toEqual([
      body.test.fit.k1,
      body.test.fit.k2,
      body.test.fit.f0,
    ]);
    expect(Boolean(row.is_demo)).toBe(false);
    expect(after.objects).toEqual([...before.objects, row.storage_key].sort());
    expect(after.tests).toBe(before.tests + 1);
    expect(after.audit).toBe(before.audit + 1);
    const audit = await db('audit_log').orderBy('id', 'desc').first();
    expect([audit.action, audit.entity, audit.entity_id, audit.actor_id]).toEqual([
      'relaxation-test.upload',
      'relaxation_test',
      String(row.id),
      ids.editor,
    ]);
  });

  it('the demo file, byte for byte, is recorded as a demo', async () => {
    as('editor');
    const { status, body } = await upload(DEMO, FIELDS, undefined, 'relaxation-demo.csv');
    expect([status, body.test.isDemo]).toEqual([201, true]);
    const row = await db('relaxation_tests').where({ id: body.test.id }).first();
    expect(Boolean(row.is_demo)).toBe(true);
  });

  it('a failed transaction deletes the stored object again', async () => {
    // The audit table is renamed away for a moment, so the transaction's audit insert fails.
    as('editor');
    const before = await storedState();
    await db.schema.renameTable('audit_log', 'audit_log_away');
    let status: number;
    try {
      status = (await upload(GOOD)).status;
    } finally {
      await db.schema.renameTable('audit_log_away', 'audit_log');
    }
    expect(status).toBe(500);
    expect(await storedState()).toEqual(before);
  });

  describe('a bad file answers 400 with its row and problem beside the file, and stores nothing', () => {
    for (const [name, file, message] of BAD_RELAXATION_FILES) {
      it(name, async () => {
        as('editor');
        const before = await storedState();
        const { status, body } = await upload(file);
        expect(status).toBe(400);
        expect(body.message).toMatch(message);
        expect(body.fieldErrors.file[0]).toMatch(message);
        expect(await storedState()).toEqual(before);
      });
    }

    it('a body far over the limit is refused with 413 before it is read', async () => {
      as('editor');
      const before = await storedState();
      expect((await upload(Buffer.alloc(3 * 1024 * 1024, '1'))).status).toBe(413);
      expect(await storedState()).toEqual(before);
    });

    it('no file part at all asks for a file', async () => {
      as('editor');
      const { status, body } = await upload(null);
      expect([status, body.fieldErrors.file]).toEqual([400, ['Choose a CSV file to upload.']]);
    });
  });

  describe('bad fields are field errors, and store nothing', () => {
    const specimen = FIELDS.specimen;
    const cases: [string, Record<string, string>, string, RegExp][] = [
      ['no held travel', { specimen }, 'deformationMm', /^Give the held plate travel/],
      [
        'travel not a number',
        { specimen, deformationMm: 'abc' },
        'deformationMm',
        /a number in mm/,
      ],
      ['travel 0', { specimen, deformationMm: '0' }, 'deformationMm', /above 0 and at most 100 mm/],
      ['travel 101 mm', { specimen, deformationMm: '101' }, 'deformationMm', /at most 100 mm/],
      ['no specimen', { deformationMm: '5' }, 'specimen', /^Choose the specimen/],
      [
        'a specimen off the list',
        { deformationMm: '5', specimen: 'probe' },
        'specimen',
        /^Choose the specimen/,
      ],
      ['−6 °C', { ...FIELDS, temperatureC: '-6' }, 'temperatureC', /from -5 to 50 °C/],
      ['51 °C', { ...FIELDS, temperatureC: '51' }, 'temperatureC', /from -5 to 50 °C/],
      [
        'a loading rate of 61 characters',
        { ...FIELDS, loadingRate: 'x'.repeat(61) },
        'loadingRate',
        /at most 60/,
      ],
    ];
    for (const [name, fields, field, message] of cases) {
      it(name, async () => {
        as('editor');
        const before = await storedState();
        const { status, body } = await upload(GOOD, fields);
        expect(status).toBe(400);
        expect(body.fieldErrors[field].join(' ')).toMatch(message);
        expect(await storedState()).toEqual(before);
      });
    }

    it('a bad file and a bad field are named in one answer', async () => {
      as('editor');
      const before = await storedState();
      const file = pelegCsv(PELEG, 'time_ms,force_n');
      const { status, body } = await upload(file, { specimen: 'probe', deformationMm: '0' });
      expect(status).toBe(400);
      expect(Object.keys(body.fieldErrors).sort()).toEqual(['deformationMm', 'file', 'specimen']);
      expect(body.fieldErrors.file).toEqual(["row 1: time is in 'ms'; give it in s"]);
      expect(await storedState()).toEqual(before);
    });

    it('an unknown cultivar is 404 and stores nothing', async () => {
      as('editor');
      const before = await storedState();
      const { status } = await upload(GOOD, FIELDS, undefined, 'relax.csv', 'apple-nowhere');
      expect(status).toBe(404);
      expect(await storedState()).toEqual(before);
    });
  });
});
