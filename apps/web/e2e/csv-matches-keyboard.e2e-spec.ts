import { openBrowser, OpenBrowser, screenshot, signIn } from './setup/browser';
import { createLot, DEMO_PASSWORD, endBenchRun, recordPartsFromKeyboard, serials, startBenchRun } from './setup/bench';
import { reviewGridCells, serverParts, type ServerPartRow } from './setup/lot-review';

// Two identical 4-part lots of the seed's released RB-40 rev B, measured against its MG-1.500-A master.
const SPEC = /RB-40 rev B/;
const MASTER = /MG-1\.500/;
const ZERO = '0';
const MASTER_END = '0.00001';
const KEYED = { lotNumber: 'L-E2E-KEYED', prefix: 'KEY-' };
const UPLOADED = { lotNumber: 'L-E2E-CSV', prefix: 'CSV-' };
const STATIONS = ['P1', 'P2', 'P3', 'P4', 'P5'];
/**
 * Top-face readings (in) per part, P1…P5, invented to cover every verdict: mid-band, at the top
 * limit (guard band), above the band, and a centre standing proud of a flat face.
 */
const READINGS = [
  ['-0.00021', '-0.00019', '-0.0002', '-0.0002', '-0.00022'],
  ['-0.00008', '-0.00009', '-0.00007', '-0.00008', '-0.00008'],
  ['0.00005', '0.00004', '0.00006', '0.00005', '0.00005'],
  ['-0.0002', '-0.0002', '-0.0002', '-0.0002', '0'],
];

jest.setTimeout(240_000);

/** The readings file for the uploaded lot: one row per reading, the same numbers as keyed. */
function readingsCsv(partSerials: readonly string[]): string {
  const rows = READINGS.flatMap((values, part) =>
    values.map((value, station) => `${partSerials[part]},${STATIONS[station]},${value},in`),
  );
  return ['serial,station,reading,unit', ...rows].join('\n') + '\n';
}

/** What a part's stored result is, without what differs by construction (ids, serials, times). */
function result(part: ServerPartRow) {
  return {
    status: part.status,
    height: part.height,
    flatness: part.flatness,
    parallelism: part.parallelism,
    expandedUncertainty: part.expandedUncertainty,
    verdict: part.verdict,
    verdicts: part.verdicts,
    runFlagged: part.runFlagged,
  };
}

describe('a CSV upload and keyed readings give the same results (browser)', () => {
  let browser: OpenBrowser;
  beforeEach(async () => {
    // Tall and wide enough that the Lot review grid draws every row and column.
    browser = await openBrowser({ width: 1600, height: 1800 });
  });
  afterEach(() => browser.close());

  it('stores identical heights, form errors, uncertainties and verdicts for the same readings', async () => {
    const { page } = browser;
    await signIn(page, 'engineer@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    const keyedLotId = await createLot(page, { spec: SPEC, quantity: 4, ...KEYED });
    const uploadedLotId = await createLot(page, { spec: SPEC, quantity: 4, ...UPLOADED });
    await page.getByRole('button', { name: 'Sign out' }).click();

    await signIn(page, 'inspector@kestrel.example', DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();

    // Lot 1: every reading keyed at the Bench, keyboard only.
    await startBenchRun(page, { lotNumber: KEYED.lotNumber, master: MASTER, zero: ZERO });
    const keyedVerdicts = await recordPartsFromKeyboard(page, serials(KEYED.prefix, 4), READINGS);
    await endBenchRun(page, KEYED.lotNumber, MASTER_END);
    await page.getByText('Run ended — 4 parts saved').waitFor();

    // Lot 2: a run with the same master, instrument, temperatures and zero; the readings from a CSV.
    await startBenchRun(page, { lotNumber: UPLOADED.lotNumber, master: MASTER, zero: ZERO });
    await page.getByText(`Next part: ${UPLOADED.prefix}001`).waitFor();
    await page.getByRole('button', { name: 'Upload a CSV instead' }).click();
    const dialog = page.getByRole('dialog', { name: 'Upload readings from a CSV' });
    await dialog.locator('input[type="file"]').setInputFiles({
      name: 'l-e2e-csv.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(readingsCsv(serials(UPLOADED.prefix, 4)), 'utf8'),
    });
    await dialog.getByText('20 rows, 4 parts, no problems found.', { exact: false }).waitFor();
    const preview = dialog.getByRole('table', { name: 'Readings by part' });
    expect(await preview.getByRole('row').count()).toBe(5);
    // The preview shows the readings as typed, in the person's unit (inch, five decimals).
    await preview.getByText(`${UPLOADED.prefix}001`, { exact: true }).waitFor();
    expect(await preview.getByRole('row').nth(1).innerText()).toContain(
      'P1 -0.00021 · P2 -0.00019 · P3 -0.00020 · P4 -0.00020 · P5 -0.00022',
    );
    await screenshot(page, 'csv-preview');
    await dialog.getByRole('button', { name: 'Import all 4 parts' }).click();
    await dialog
      .getByText(`Imported 20 readings: 4 parts saved (${serials(UPLOADED.prefix, 4).join(', ')}).`)
      .waitFor();
    await dialog.getByRole('button', { name: 'Close' }).click();
    await endBenchRun(page, UPLOADED.lotNumber, MASTER_END);
    await page.getByText('Run ended — 4 parts saved').waitFor();

    // The server's stored results, read with the inspector's own session.
    const keyed = await serverParts(page, keyedLotId);
    const uploaded = await serverParts(page, uploadedLotId);
    expect(keyed.map((p) => p.serial)).toEqual(serials(KEYED.prefix, 4));
    expect(uploaded.map((p) => p.serial)).toEqual(serials(UPLOADED.prefix, 4));
    for (const part of keyed) {
      expect(part.height).not.toBeNull();
      expect(part.flatness).not.toBeNull();
      expect(part.expandedUncertainty).not.toBeNull();
      expect(part.verdict).not.toBeNull();
    }
    // The readings were chosen to give more than one verdict, so a mix-up between parts shows.
    expect(new Set(keyed.map((p) => p.verdict)).size).toBeGreaterThan(1);
    expect(uploaded.map(result)).toEqual(keyed.map(result));
    // …and the Bench told the inspector what the server stored.
    expect(keyedVerdicts.map((v) => v.replace(/ — (high|low)$/, ''))).toEqual(
      keyed.map((p) =>
        p.verdict === 'conforms' ? 'Conforms' : p.verdict === 'does-not-conform' ? 'Does not conform' : 'In guard band',
      ),
    );

    // The Lot reviews show the same figures, part for part.
    const keyedGrid = await reviewGridCells(
      page,
      keyedLotId,
      KEYED.lotNumber,
      keyed.map((p) => p.id),
    );
    await screenshot(page, 'csv-matches-keyboard-review-keyed');
    const uploadedGrid = await reviewGridCells(
      page,
      uploadedLotId,
      UPLOADED.lotNumber,
      uploaded.map((p) => p.id),
    );
    await screenshot(page, 'csv-matches-keyboard-review-uploaded');
    const shown = (grid: typeof keyedGrid, parts: ServerPartRow[]) => parts.map((p) => grid.get(p.id));
    expect(shown(keyedGrid, keyed).every((cells) => cells !== undefined && /\d/.test(cells.height))).toBe(true);
    expect(shown(uploadedGrid, uploaded)).toEqual(shown(keyedGrid, keyed));
  });
});
