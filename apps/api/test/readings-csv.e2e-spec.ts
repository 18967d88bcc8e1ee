import type { ReadingsImport, ReadingsPreview } from '@evenset/contracts';
import { CSRF_HEADER } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { InspectionReading } from '../src/inspections/inspection-reading.entity';
import { InspectionResult } from '../src/inspections/inspection-result.entity';
import { Inspection } from '../src/inspections/inspection.entity';
import { ensureLot } from '../src/database/factories/lot.factory';
import { ensureSpec } from '../src/database/factories/spec.factory';
import { RB40_REV_B } from '../src/database/seeders/demo-specs';
import { Bench, givenBench, givenLot, RB40_STATIONS, startRun } from './setup/bench';
import { startTestApp, TestApp } from './setup/test-app';

const FIXTURES = join(__dirname, '../../../fixtures/csv');
const HEADER = 'serial,station,reading,unit';

/** A file for `serials`, every RB-40 station, one reading per row. */
function csvFor(serials: string[], reading = (i: number) => (-0.0002 + (i % 3) * 0.00001).toFixed(5)): string {
  const rows = serials.flatMap((serial) => RB40_STATIONS.map((station, i) => `${serial},${station},${reading(i)},in`));
  return [HEADER, ...rows].join('\n');
}

describe('readings uploaded as CSV', () => {
  let t: TestApp;
  let bench: Bench;
  let runId: string;

  beforeAll(async () => {
    t = await startTestApp();
    bench = await givenBench(t);
    const lot = await givenLot(bench, 'L-CSV', ['K-1', 'K-2', 'K-3']);
    runId = (await startRun(bench, lot.id)).id;
  }, 60_000);
  afterAll(() => t.close());

  const upload = (action: 'preview' | 'import', content: string | Buffer, run = runId) =>
    bench.inspector.agent
      .post(`/api/runs/${run}/readings/${action}`)
      .set(CSRF_HEADER, bench.inspector.csrf)
      .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content, 'utf8'), 'readings.csv');
  const counts = async () => {
    const em = t.app.get(EntityManager).fork();
    return [
      await em.count(Inspection, {}),
      await em.count(InspectionReading, {}),
      await em.count(InspectionResult, {}),
    ];
  };

  /** Previews the file, expects exactly these problems, and checks that importing it saves nothing. */
  async function refused(
    content: string | Buffer,
    expected: { row: number; column: string | null; message: string | RegExp }[],
  ) {
    const preview = (await upload('preview', content).expect(200)).body as ReadingsPreview;
    expect(preview.errors).toEqual(
      expected.map((e) =>
        expect.objectContaining({
          ...e,
          message: typeof e.message === 'string' ? e.message : expect.stringMatching(e.message),
        }),
      ),
    );
    const before = await counts();
    const res = await upload('import', content).expect(400);
    expect(res.body.code).toBe('CSV_REFUSED');
    expect(await counts()).toEqual(before);
  }

  it('previews rows mapped to parts and stations, then imports them all in one go', async () => {
    const content = readFileSync(join(FIXTURES, 'readings-example.csv'));
    const preview = (await upload('preview', content).expect(200)).body as ReadingsPreview;
    expect(preview.errors).toEqual([]);
    expect(preview.rows).toBe(10);
    expect(preview.parts.map((p) => [p.serial, p.readings.length, p.missingStations])).toEqual([
      ['K-1', 5, []],
      ['K-2', 5, []],
    ]);
    expect(await counts()).toEqual([0, 0, 0]);
    const imported = (await upload('import', content).expect(201)).body as ReadingsImport;
    expect(imported).toMatchObject({ inspections: 2, readings: 10 });
    expect(await counts()).toEqual([2, 10, 2]);
  });

  it('accepts a byte-order mark, Windows line ends, any column order and a millimetre unit', async () => {
    const content =
      '\uFEFFunit,reading,station,serial\r\n' + RB40_STATIONS.map((s) => `mm,-0.00508,${s},k-3`).join('\r\n') + '\r\n';
    const preview = (await upload('preview', content).expect(200)).body as ReadingsPreview;
    expect(preview.errors).toEqual([]);
    expect(preview.parts[0]!.readings[0]).toEqual({ row: 2, station: 'P1', reading: -0.00508 });
  });

  it('refuses an empty file', () => refused('', [{ row: 1, column: null, message: /The file is empty/ }]));

  it('refuses a file separated by semicolons', () =>
    refused('serial;station;reading;unit\nK-1;P1;0;in', [
      { row: 1, column: null, message: /separated by semicolons; separate them with commas/ },
    ]));

  it('refuses a missing column', () =>
    refused('serial,station,reading\nK-1,P1,0', [
      { row: 1, column: 'unit', message: 'The header has no "unit" column.' },
    ]));

  it('refuses unknown serials and stations, duplicates and missing stations, row by row', () => {
    const rows = csvFor(['K-1']).split('\n');
    rows.push('K-9,P1,0,in', 'K-1,P7,0,in', 'K-1,P2,0.0001,in');
    return refused(rows.join('\n'), [
      { row: 7, column: 'serial', message: 'There is no part K-9 in lot L-CSV.' },
      { row: 8, column: 'station', message: 'There is no station "P7" in the plan of RB-40 rev B.' },
      { row: 9, column: 'station', message: 'Part K-1 already has a reading at station P2 (row 3).' },
    ]).then(() =>
      refused([HEADER, 'K-2,P1,0,in', 'K-2,P2,0,in'].join('\n'), [
        {
          row: 2,
          column: 'station',
          message: 'Part K-2 has no reading at stations P3, P4, P5; every station of the plan is needed.',
        },
      ]),
    );
  });

  it('refuses non-numbers, values with units and decimal commas, saying what is wrong', () => {
    const rows = csvFor(['K-1']).split('\n');
    rows[1] = 'K-1,P1,1.2.3,in';
    rows[2] = 'K-1,P2,1.5002 in,in';
    rows[3] = 'K-1,P3,"1,5002",in';
    rows[4] = 'K-1,P4,0,inch';
    rows[5] = 'K-1,P5,1,5002,in';
    return refused(rows.join('\n'), [
      { row: 2, column: 'reading', message: '"1.2.3" is not a number.' },
      {
        row: 3,
        column: 'reading',
        message: '"1.5002 in" carries a unit: write the number alone and put the unit in the unit column.',
      },
      {
        row: 4,
        column: 'reading',
        message: '"1,5002" has a comma: use a dot for decimals and no thousands separators (e.g. 1.5002).',
      },
      { row: 5, column: 'unit', message: 'The unit must be "in" or "mm", not "inch".' },
      { row: 6, column: null, message: /This row has 5 fields; the header has 4. A comma inside a number/ },
    ]);
  });

  it('refuses a file over the row limit with a clear message', async () => {
    const content = [HEADER, ...Array.from({ length: 200_001 }, () => 'K-1,P1,0,in')].join('\n');
    const res = await upload('preview', content).expect(200);
    expect(res.body.errors[0].message).toBe('The file has 200,001 rows; at most 200,000 fit in one upload.');
  });

  it('imports 100,000 readings in one transaction, all counted', async () => {
    // A 10 × 5 grid of 50 stations on 2,000 parts: 100,000 rows.
    const stations = Array.from({ length: 50 }, (_, i) => ({
      name: `G${i + 1}`,
      x: (i % 10) * 4,
      y: Math.floor(i / 10) * 8,
    }));
    const em = t.app.get(EntityManager).fork();
    const spec = await ensureSpec(em, {
      partNumber: 'GRID-50',
      revision: 'A',
      status: 'released',
      material: bench.steel,
      definition: { ...RB40_REV_B, unit: 'mm', plan: { stations, datumStations: [], runoutCircles: [] } },
    });
    await em.flush();
    const serials = Array.from({ length: 2_000 }, (_, i) => `G-${String(i).padStart(4, '0')}`);
    const lot = await ensureLot(em, { lotNumber: 'L-BIG', spec, grindDate: '2026-11-20', serials });
    const run = await startRun(bench, lot.id);
    // Readings a few tenths apart, varying like a ground face rather than a lattice.
    const reading = (p: number, i: number) => (-0.0002 + 0.00002 * Math.sin(p * 7.3 + i * 1.7)).toFixed(6);
    const rows = serials.flatMap((serial, p) => stations.map((s, i) => `${serial},${s.name},${reading(p, i)},in`));
    expect(rows).toHaveLength(100_000);
    const before = await counts();
    const started = Date.now();
    const res = await upload('import', [HEADER, ...rows].join('\n'), run.id).expect(201);
    expect(res.body).toMatchObject({ inspections: 2_000, readings: 100_000 });
    expect(Date.now() - started).toBeLessThan(45_000);
    expect(await counts()).toEqual([before[0]! + 2_000, before[1]! + 100_000, before[2]! + 2_000]);
  }, 60_000);
});
