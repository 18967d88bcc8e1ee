import { ensureLot } from '../../src/database/factories/lot.factory';
import type { Spec } from '../../src/specs/spec.entity';
import { type Bench, partRows, post, startRun, topReadings } from './bench';

/**
 * RB-40 rev B parts inspected level at 20 °C against MG-1.500-A (calibrated 38.10008 mm, master
 * reading 0), then released: height = 38.10008 mm + 25.4 × reading (brief, "Height by comparison";
 * 1 in = 25.4 mm, NIST SP 811 App. B; no temperature correction at 20 °C, ISO 1). `spec` is
 * RB-40 rev B unless another revision with the same stations is given.
 */
export async function releasedAt20C(
  bench: Bench,
  lotNumber: string,
  readings: Record<string, number>,
  spec: Spec = bench.spec,
) {
  const lot = await ensureLot(bench.em, { lotNumber, spec, grindDate: '2026-11-20', serials: Object.keys(readings) });
  const ids = Object.fromEntries((await partRows(bench, lot.id)).items.map((r) => [r.serial, r.id]));
  const run = await startRun(bench, lot.id, { partTemperature: 20, masterTemperature: 20 });
  for (const [serial, reading] of Object.entries(readings)) {
    const res = await post(bench.inspector, `/api/runs/${run.id}/inspections`, {
      partId: ids[serial],
      unit: 'in',
      readings: topReadings([reading]),
    }).expect(201);
    // A part within the uncertainty of a limit sits in the guard band: accepted for use as is first.
    if ((res.body as { result: { verdict: string } }).result.verdict === 'guard-band')
      await post(bench.engineer, `/api/parts/${ids[serial]}/dispositions`, {
        kind: 'use-as-is',
        reason: 'Spare stock for replacement checks.',
      }).expect(201);
    await post(bench.engineer, `/api/parts/${ids[serial]}/release`, {}).expect(201);
  }
  return { ids: ids as Record<string, string>, lotId: lot.id };
}
