import type { Page } from '@playwright/test';
import { expect, test } from './fixtures';
import { sameSite } from './editor-helpers';

// The units of each system, written out by hand: a page or export in one system must show none
// of the other's beside a number or in a heading's "(unit)". Quoted prose (a method, a note, how
// a source was read) is marked data-prose and left out: a note may carry its own arithmetic.
const UNITS = {
  si: ['mm³/J', 'mm³', 'mm²', 'mm', 'MPa', 'kPa', 'kg/m³', 'm/s²', 'm/s', 'N·m', 'N', 'g', 'J'],
  us: ['in³/(ft·lbf)', 'in³', 'in²', 'in', 'psi', 'lb/ft³', 'ft/s²', 'ft/s', 'lbf·in', 'lbf', 'oz'],
} as const;
type System = keyof typeof UNITS;
const other = (s: System): System => (s === 'si' ? 'us' : 'si');
const escape = (u: string) => u.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');

function unitsOf(system: System, text: string): string[] {
  const found: string[] = [];
  for (const u of UNITS[system]) {
    const re = new RegExp(`(\\d\\s?${escape(u)}(?![\\w³²·/(])|\\(${escape(u)}\\))`, 'g');
    for (const m of text.matchAll(re)) found.push(text.slice(m.index - 40, m.index + 20));
  }
  return found;
}

/** The main content's text without quoted prose. */
async function shownText(page: Page): Promise<string> {
  return page.locator('main').evaluate((main) => {
    const copy = main.cloneNode(true) as HTMLElement;
    copy.querySelectorAll('[data-prose]').forEach((n) => n.remove());
    // Tooltips are hidden until hovered; their text is part of what a reader can see.
    return copy.textContent ?? '';
  });
}

async function chooseUnits(page: Page, system: System) {
  await page.goto('/account');
  const form = page.getByTestId('unit-system-form');
  await form.getByLabel(system === 'us' ? /US customary/ : /SI \(mm/).check();
  await form.getByRole('button', { name: 'Save units' }).click();
  await expect(form.getByTestId('form-success')).toContainText(
    system === 'us' ? 'US customary' : 'SI units',
  );
}

const ALL_COLUMNS =
  'youngs_modulus,poisson_ratio,density,diameter,mass,static_bruise_threshold,failure_stress,' +
  'bioyield_stress,penetrometer_firmness,impact_threshold_energy,drop_threshold_height,' +
  'friction_coefficient,bulk_density,lateral_pressure_ratio,bruise_susceptibility';

// Illustrative inputs, not data: an 80 mm, 200 g fruit with E = 3 MPa, in a 1200 mm bin.
const STACK = {
  check: 'stack',
  title: 'Units walk bin',
  inputs: {
    modulusMpa: 3,
    poisson: 0.35,
    diameterMm: 80,
    massG: 200,
    staticThresholdKpa: 100,
    binLengthMm: 1200,
    binWidthMm: 1000,
    fillDepthMm: 600,
  },
};

for (const system of ['si', 'us'] as const) {
  test(`every page and export in ${system === 'us' ? 'US customary' : 'SI'} units shows none of the other system`, async ({
    page,
    signInAs,
  }) => {
    await signInAs('admin');
    await chooseUnits(page, system);
    try {
      // The properties table, every column, one long page; then its range filter in our units.
      await page.goto(`/properties?cols=${ALL_COLUMNS}&size=100`);
      const table = page.getByTestId('properties-table');
      await expect(table).toBeVisible();
      let text = await shownText(page);
      expect(unitsOf(system, text).length).toBeGreaterThan(50);
      expect(unitsOf(other(system), text)).toEqual([]);
      await page.getByLabel('Range on').selectOption('youngs_modulus');
      await expect(
        page.getByText(system === 'us' ? 'At least (psi)' : 'At least (MPa)'),
      ).toBeVisible();
      // 300 psi = 2.07 MPa: apples' flesh moduli lie above it (the issue's "0 of 43 match").
      await page.getByLabel(/At least/).fill(system === 'us' ? '300' : '2,07');
      await expect(page.getByTestId('match-count')).not.toContainText(/^0 of/);
      await page.getByLabel(/At least/).fill('1,234,5');
      await expect(page.locator('#filter-range-problem')).toContainText('more than one comma');

      // A cultivar page with many quantities, sources and conditions.
      await page.goto('/properties/apple-jonathan');
      text = await shownText(page);
      expect(unitsOf(system, text).length).toBeGreaterThan(3);
      expect(unitsOf(other(system), text)).toEqual([]);

      // A saved stack check: its report page, PDF and both CSVs.
      const saved = await page.request.post('/api/assessments', {
        data: STACK,
        headers: sameSite(page),
      });
      expect(saved.status()).toBe(201);
      const { assessment } = await saved.json();
      await page.goto(`/assessments/${assessment.id}`);
      await expect(page.getByTestId('assessment-report')).toBeVisible();
      text = await shownText(page);
      expect(unitsOf(system, text).length).toBeGreaterThan(3);
      expect(unitsOf(other(system), text)).toEqual([]);
      // Chart ticks at round values: evenly spaced by 1, 2 or 5 × a power of ten.
      // The chart draws once its container has a size: wait for its first tick (recharts 3 draws
      // the tick labels in their own layer, not inside the axis group).
      const tickTexts = page
        .getByTestId('chart-stack-pressure')
        .locator('.recharts-xAxis-tick-labels .recharts-cartesian-axis-tick-value');
      await expect(tickTexts.first()).toBeAttached();
      const ticks = (await tickTexts.allTextContents()).map(Number);
      expect(ticks.length).toBeGreaterThan(2);
      const step = ticks[1] - ticks[0];
      const mantissa = step / 10 ** Math.floor(Math.log10(step));
      expect([1, 2, 5]).toContain(Math.round(mantissa * 1e6) / 1e6);
      ticks.forEach((t, i) => expect(Math.abs(t - ticks[0] - i * step)).toBeLessThan(step * 1e-6));
      const pdf = await page.request.get(`/api/assessments/${assessment.id}/report`);
      expect(pdf.headers()['content-type']).toBe('application/pdf');
      const inputs = await (
        await page.request.get(`/api/assessments/${assessment.id}/inputs`)
      ).text();
      const unitColumn = inputs.split('\r\n').map((l) => l.split(',')[2]);
      expect(unitColumn).toContain(system === 'us' ? 'in' : 'mm');
      expect(
        unitColumn.filter((u) => (UNITS[other(system)] as readonly string[]).includes(u)),
      ).toEqual([]);
      const curves = await (
        await page.request.get(`/api/assessments/${assessment.id}/curves`)
      ).text();
      expect(curves.split('\r\n')[0].split(',')[0]).toBe(system === 'us' ? 'depth_in' : 'depth_mm');

      // The stack check's defaults at round values in our units; a decimal comma read, a doubtful
      // text refused beside its field.
      await page.goto('/checks/stack');
      await expect(page.getByLabel('Bin inside length')).toHaveValue(
        system === 'us' ? '47' : '1200',
      );
      await page.getByLabel('Fill depth').fill(system === 'us' ? '20,5' : '520,5');
      await expect(page.getByText('Type a number')).toHaveCount(0);
      await page.getByLabel('Fill depth').fill('1,234,5');
      await expect(page.getByText('"1,234,5" has more than one comma')).toBeVisible();
      await page.screenshot({
        path: `tests/artifacts/units-walk-stack-${system}.png`,
        fullPage: true,
      });
    } finally {
      await chooseUnits(page, 'si');
    }
  });
}
