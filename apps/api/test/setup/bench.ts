import { CSRF_HEADER, type PartRow } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { ensureInstrument } from '../../src/database/factories/instrument.factory';
import { ensureLot } from '../../src/database/factories/lot.factory';
import { ensureMaster } from '../../src/database/factories/master.factory';
import { ensureMaterial } from '../../src/database/factories/material.factory';
import { ensureSpec } from '../../src/database/factories/spec.factory';
import { demoInstruments, demoMasters } from '../../src/database/seeders/demo-gauges';
import { RB40_REV_B } from '../../src/database/seeders/demo-specs';
import { STEEL } from '../../src/database/seeders/shop-materials';
import type { Spec } from '../../src/specs/spec.entity';
import { Browser, signInAs, TestApp } from './test-app';

/** RB-40 rev B's top-face stations (5 stations, mean height, guarded rule). */
export const RB40_STATIONS = ['P1', 'P2', 'P3', 'P4', 'P5'];

/** A test database with RB-40 rev B released, the demo masters and instruments, an engineer and an inspector. */
export async function givenBench(t: TestApp) {
  const em = t.app.get(EntityManager).fork();
  const steel = await ensureMaterial(em, STEEL);
  await em.flush();
  const spec = await ensureSpec(em, {
    partNumber: 'RB-40',
    revision: 'B',
    status: 'released',
    material: steel,
    definition: RB40_REV_B,
  });
  const masters = [];
  for (const seed of demoMasters(steel)) masters.push(await ensureMaster(em, seed));
  const indicator = await ensureInstrument(em, demoInstruments()[0]!);
  await em.flush();
  const engineer = await signInAs(t.app, ['engineer']);
  const inspector = await signInAs(t.app, ['inspector']);
  return {
    em,
    spec: spec as Spec,
    steel,
    /** MG-1.500-A: in service, calibrated size 38.10008 mm after its correction. */
    master: masters[0]!,
    /** MG-12-A: overdue. */
    overdueMaster: masters[2]!,
    /** IND-01: 0.0001 in. */
    indicator,
    engineer,
    inspector,
  };
}

export type Bench = Awaited<ReturnType<typeof givenBench>>;

export const post = (browser: Browser, path: string, body?: object) =>
  browser.agent.post(path).set(CSRF_HEADER, browser.csrf).send(body);

/** A lot of `serials` made with the demo seeder's factory. */
export async function givenLot(bench: Bench, lotNumber: string, serials: string[]) {
  return ensureLot(bench.em, { lotNumber, spec: bench.spec, grindDate: '2026-11-20', serials });
}

/** Starts a run on a lot with the in-service master and the indicator, readings in inches. */
export async function startRun(
  bench: Bench,
  lotId: string,
  fields: { masterStartReading?: number; partTemperature?: number; masterTemperature?: number } = {},
) {
  const res = await post(bench.inspector, '/api/runs', {
    lotId,
    masterId: bench.master.id,
    instrumentId: bench.indicator.id,
    unit: 'in',
    masterTemperature: 20.5,
    partTemperature: 21,
    masterStartReading: 0,
    ...fields,
  }).expect(201);
  return res.body as { id: string; flagged: boolean; drift: number | null };
}

/** Readings for every RB-40 top station, in inches. */
export const topReadings = (values: number[]) =>
  RB40_STATIONS.map((station, i) => ({ station, reading: values[i] ?? values[0]! }));

export async function partRows(bench: Bench, lotId: string, query: Record<string, string> = {}) {
  const res = await bench.engineer.agent.get(`/api/lots/${lotId}/parts`).query(query).expect(200);
  return res.body as { items: PartRow[]; total: number };
}
