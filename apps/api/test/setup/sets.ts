import type { Customer, SetRow } from '@evenset/contracts';
import { type Bench, givenLot, post, startRun, topReadings } from './bench';
import type { Browser } from './test-app';

/**
 * A lot of RB-40 rev B parts, each inspected with a level face at the given reading (in) and
 * released by the engineer (after accepting it for use as is when it falls in a guard band). Answers part ids and current heights (mm) by serial.
 */
export async function givenReleasedParts(
  bench: Bench,
  lotNumber: string,
  readings: Record<string, number>,
): Promise<{ ids: Record<string, string>; heights: Record<string, number> }> {
  const lot = await givenLot(bench, lotNumber, Object.keys(readings));
  const run = await startRun(bench, lot.id);
  const ids: Record<string, string> = {};
  const heights: Record<string, number> = {};
  const rows = await bench.engineer.agent.get(`/api/lots/${lot.id}/parts`).query({ pageSize: '500' }).expect(200);
  for (const row of rows.body.items as { id: string; serial: string }[]) ids[row.serial] = row.id;
  for (const [serial, reading] of Object.entries(readings)) {
    const res = await post(bench.inspector, `/api/runs/${run.id}/inspections`, {
      partId: ids[serial],
      unit: 'in',
      readings: topReadings([reading]),
    }).expect(201);
    const { result } = res.body as { result: { height: number; verdict: string } };
    heights[serial] = result.height;
    // A part in the guard band goes out only after an engineer accepts it for use as is.
    if (result.verdict === 'guard-band')
      await post(bench.engineer, `/api/parts/${ids[serial]}/dispositions`, {
        kind: 'use-as-is',
        reason: 'Within the uncertainty of the limit; accepted by engineering.',
      }).expect(201);
    const released = await post(bench.engineer, `/api/parts/${ids[serial]}/release`, {});
    if (released.status !== 201)
      throw new Error(`${serial} (reading ${reading} in) was not released: ${released.body.message}`);
  }
  return { ids, heights };
}

/** A customer made through the product's route. */
export async function givenCustomer(sales: Browser, name: string): Promise<Customer> {
  const res = await post(sales, '/api/customers', {
    name,
    contactEmail: `buyer@${name.toLowerCase().replace(/\W+/g, '-')}.example`,
  }).expect(201);
  return res.body as Customer;
}

/** Sets of RB-40 allocated to a customer's order through the product's route. */
export async function givenSoldSets(
  sales: Browser,
  order: { customerId: string; orderReference: string },
  sets: string[][],
): Promise<SetRow[]> {
  const res = await post(sales, '/api/sets', {
    partNumber: 'RB-40',
    ...order,
    sets: sets.map((partIds) => ({ partIds })),
  }).expect(201);
  return (res.body as { items: SetRow[] }).items;
}
