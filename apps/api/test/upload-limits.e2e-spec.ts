import { CSRF_HEADER, MAX_READINGS_FILE_BYTES, MAX_READINGS_ROWS } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { InspectionReading } from '../src/inspections/inspection-reading.entity';
import { Inspection } from '../src/inspections/inspection.entity';
import { Bench, givenBench, givenLot, RB40_STATIONS, startRun } from './setup/bench';
import { startTestApp, TestApp } from './setup/test-app';

const HEADER = 'serial,station,reading,unit';
const GOOD = [HEADER, ...RB40_STATIONS.map((station) => `U-1,${station},-0.0002,in`)].join('\n');

describe('limits of a readings upload: size, rows and content', () => {
  let t: TestApp;
  let bench: Bench;
  let runId: string;

  beforeAll(async () => {
    t = await startTestApp();
    bench = await givenBench(t);
    const lot = await givenLot(bench, 'L-LIMITS', ['U-1', 'U-2']);
    runId = (await startRun(bench, lot.id)).id;
  }, 60_000);
  afterAll(() => t.close());

  const upload = (action: 'preview' | 'import', content: Buffer | string, filename: string) =>
    bench.inspector.agent
      .post(`/api/runs/${runId}/readings/${action}`)
      .set(CSRF_HEADER, bench.inspector.csrf)
      .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content, 'utf8'), {
        filename,
        contentType: 'text/csv',
      });
  const stored = async () => {
    const em = t.app.get(EntityManager).fork();
    return [await em.count(Inspection, {}), await em.count(InspectionReading, {})];
  };

  /** Both routes refuse the file with `status` and `code`; the import stores nothing. */
  async function refused(content: Buffer | string, filename: string, status: number, code: string) {
    const before = await stored();
    const preview = await upload('preview', content, filename).expect(status);
    const imported = await upload('import', content, filename).expect(status);
    expect([preview.body.code, imported.body.code]).toEqual([code, code]);
    expect(await stored()).toEqual(before);
    return imported.body as { message: string; details: { path: string; message: string }[] };
  }

  it('refuses a file over 20 MB with 413, naming the limit', async () => {
    expect(MAX_READINGS_FILE_BYTES).toBe(20 * 1024 * 1024);
    const line = 'U-1,P1,-0.0002,in\n';
    const big = Buffer.from(`${HEADER}\n${line.repeat(Math.ceil(MAX_READINGS_FILE_BYTES / line.length))}`, 'utf8');
    expect(big.length).toBeGreaterThan(MAX_READINGS_FILE_BYTES);
    const body = await refused(big, 'readings.csv', 413, 'CSV_TOO_LARGE');
    expect(body.message).toBe('A readings file can be at most 20 MB and 200,000 rows; split it into several uploads.');
    expect(body.details).toEqual([{ path: 'file', message: 'The file is over 20 MB.' }]);
  }, 30_000);

  it('refuses more rows than the limit on import, naming the limit', async () => {
    const rows = Array.from({ length: MAX_READINGS_ROWS + 1 }, () => 'U-1,P1,-0.0002,in');
    const before = await stored();
    const res = await upload('import', [HEADER, ...rows].join('\n'), 'readings.csv').expect(400);
    expect(res.body.code).toBe('CSV_REFUSED');
    expect(res.body.details).toEqual([
      { path: 'row 1', message: 'The file has 200,001 rows; at most 200,000 fit in one upload.' },
    ]);
    expect(await stored()).toEqual(before);
  }, 30_000);

  it.each([
    ['a PNG image', Buffer.from([137, 80, 78, 71, 13, 10, 26, 10, 0, 0, 0, 13, 73, 72, 68, 82])],
    ['a ZIP archive or an Excel/Word file', Buffer.from('PK\u0003\u0004\u0014\u0000\u0006\u0000', 'latin1')],
    ['a PDF document', Buffer.from('%PDF-1.7\n%\u00e2\u00e3\u00cf\u00d3\n', 'latin1')],
    ['binary data', Buffer.from(`${HEADER}\nU-1,P1,-0.0002\u0000,in\n`, 'utf8')],
  ])('refuses %s named .csv, judged by its content', async (what, content) => {
    const body = await refused(content, 'readings.csv', 400, 'FILE_TYPE_REFUSED');
    const message = `"readings.csv" is ${what}, not a CSV file: export the readings as comma-separated text (UTF-8).`;
    expect(body.message).toBe(message);
    expect(body.details).toEqual([{ path: 'file', message }]);
  });

  it('judges a genuine CSV by its content whatever it is called: .txt, no extension', async () => {
    for (const name of ['readings.txt', 'readings']) {
      const res = await upload('preview', GOOD, name).expect(200);
      expect(res.body).toMatchObject({ rows: 5, errors: [] });
    }
    const before = await stored();
    const res = await upload('import', GOOD, 'gauge-export').expect(201);
    expect(res.body).toMatchObject({ inspections: 1, readings: 5 });
    expect(await stored()).toEqual([before[0]! + 1, before[1]! + 5]);
  });
});
