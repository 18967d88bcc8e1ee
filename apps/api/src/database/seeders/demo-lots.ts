import type { EntityManager } from '@mikro-orm/postgresql';
import type { SessionUser } from '@evenset/contracts';
import { AuditService } from '../../audit/audit.service';
import { addDays, todayIso } from '../../common/gauges/gauge-status';
import { BenchRun } from '../../inspections/bench-run.entity';
import { InspectionsService } from '../../inspections/inspections.service';
import { planStations } from '../../inspections/measurement-plan';
import { Instrument } from '../../instruments/instrument.entity';
import { PartStatusService } from '../../lots/part-status';
import { Part } from '../../lots/part.entity';
import { PartsService } from '../../lots/parts.service';
import { InterchangeService } from '../../sets/interchange.service';
import { MasterGauge } from '../../masters/master-gauge.entity';
import { Spec } from '../../specs/spec.entity';
import { User } from '../../users/user.entity';
import { ensureLot } from '../factories/lot.factory';

/** Small station-to-station differences (in), so faces look measured rather than drawn. */
const FACE = [0.00001, -0.00001, 0, 0.000005, -0.000005];

/** One part's readings: a level face at `mean` (in), or explicit station readings. */
type DemoPart = { serial: string; mean: number } | { serial: string; stations: number[] };

interface DemoLot {
  lotNumber: string;
  partNumber: string;
  revision: string;
  grindDaysAgo: number;
  inspector: string;
  master: string;
  parts: DemoPart[];
  /** Master check at the end of the run, in. */
  masterEnd: number;
}

/**
 * Invented readings telling the demo's story (at 20.4 °C master, 20.6 °C part). RB-40 rev B is
 * measured against MG-1.500-A (1.50003 in): a mean reading near −0.0002 in is mid-band; −0.00008 in
 * sits within the uncertainty of the top limit (guard band); +0.00005 in is above the band; a
 * centre 0.0002 in proud fails the 0.0001 in flatness. Results are the server's own: computed by
 * the same service the API uses.
 */
const DEMO_LOTS: DemoLot[] = [
  {
    lotNumber: 'L-2026-041',
    partNumber: 'RB-40',
    revision: 'B',
    grindDaysAgo: 12,
    inspector: 'inspector@kestrel.example',
    master: 'MG-1.500-A',
    masterEnd: 0.00002,
    parts: [
      { serial: 'RB40-0401', mean: -0.00022 },
      { serial: 'RB40-0402', mean: -0.00018 },
      { serial: 'RB40-0403', mean: -0.00008 },
      { serial: 'RB40-0404', mean: 0.00005 },
      { serial: 'RB40-0405', stations: [-0.0002, -0.0002, -0.0002, -0.0002, 0] },
      { serial: 'RB40-0406', mean: -0.00025 },
    ],
  },
  {
    lotNumber: 'L-2026-047',
    partNumber: 'RB-40',
    revision: 'B',
    grindDaysAgo: 5,
    inspector: 'inspector2@kestrel.example',
    master: 'MG-1.500-A',
    masterEnd: -0.00001,
    parts: [
      { serial: 'RB40-0471', mean: -0.0002 },
      { serial: 'RB40-0472', mean: -0.00019 },
      { serial: 'RB40-0473', mean: -0.00021 },
      { serial: 'RB40-0474', mean: -0.00023 },
    ],
  },
  {
    lotNumber: 'L-2026-044',
    partNumber: 'PP-6',
    revision: 'A',
    grindDaysAgo: 9,
    inspector: 'inspector@kestrel.example',
    master: 'MG-1.000-A',
    masterEnd: 0.00001,
    parts: [
      { serial: 'PP6-0441', mean: -0.00004 },
      { serial: 'PP6-0442', mean: -0.00003 },
      { serial: 'PP6-0443', mean: -0.00005 },
      { serial: 'PP6-0444', mean: -0.00002 },
    ],
  },
  {
    // Sold last year: a set of four to Marrow Creek Tooling (see demo-sales.ts).
    lotNumber: 'L-2025-118',
    partNumber: 'RB-40',
    revision: 'B',
    grindDaysAgo: 310,
    inspector: 'inspector@kestrel.example',
    master: 'MG-1.500-A',
    masterEnd: 0.00001,
    parts: [
      { serial: 'RB40-1181', mean: -0.00019 },
      { serial: 'RB40-1182', mean: -0.0002 },
      { serial: 'RB40-1183', mean: -0.00021 },
      { serial: 'RB40-1184', mean: -0.0002 },
    ],
  },
  {
    // Sold last year: a pair to Fenbridge Fixture Works, ground low in the band. This year's
    // PP-6 lot (L-2026-044) came out higher and no longer matches it.
    lotNumber: 'L-2025-131',
    partNumber: 'PP-6',
    revision: 'A',
    grindDaysAgo: 240,
    inspector: 'inspector2@kestrel.example',
    master: 'MG-1.000-A',
    masterEnd: 0,
    parts: [
      { serial: 'PP6-1311', mean: -0.00015 },
      { serial: 'PP6-1312', mean: -0.00016 },
    ],
  },
  {
    lotNumber: 'L-2026-052',
    partNumber: 'RB-40',
    revision: 'B',
    grindDaysAgo: 2,
    inspector: 'inspector@kestrel.example',
    master: 'MG-1.500-A',
    masterEnd: 0.00001,
    parts: [-0.00018, -0.00019, -0.0002, -0.0002, -0.00021, -0.00021, -0.00022, -0.00023].map((mean, i) => ({
      serial: `RB40-052${i + 1}`,
      mean,
    })),
  },
];

/** Dispositions and releases an engineer made after reviewing the lots. */
const DECISIONS: [string, 'rework' | 'scrap' | 'use-as-is' | 'release', string?][] = [
  ['RB40-0404', 'rework'],
  ['RB40-0405', 'scrap', 'Top face dished 0.0002 in; not worth regrinding.'],
  ['RB40-0403', 'use-as-is', 'In the guard band at the top limit; accepted for spares by engineering.'],
  ['RB40-0401', 'release'],
  ['RB40-0402', 'release'],
  ['RB40-0403', 'release'],
  ['RB40-0406', 'release'],
  ['RB40-0471', 'release'],
  ['RB40-0472', 'release'],
  ['RB40-0473', 'release'],
  ['RB40-0474', 'release'],
  ['PP6-0441', 'release'],
  ['PP6-0442', 'release'],
  ...['RB40-1181', 'RB40-1182', 'RB40-1183', 'RB40-1184', 'PP6-1311', 'PP6-1312'].map(
    (serial) => [serial, 'release'] as [string, 'release'],
  ),
  ...Array.from({ length: 8 }, (_, i) => [`RB40-052${i + 1}`, 'release'] as [string, 'release']),
];

/** Lots, runs, inspections and dispositions of the demo, through the API's own services. Idempotent. */
export async function seedDemoLots(em: EntityManager, today = todayIso()): Promise<void> {
  const audit = new AuditService(em);
  const inspections = new InspectionsService(em, audit);
  const parts = new PartsService(
    em,
    audit,
    new PartStatusService(em, inspections),
    inspections,
    new InterchangeService(em),
  );
  const engineer = asActor(await em.findOneOrFail(User, { email: 'engineer@kestrel.example' }));
  const indicator = await em.findOneOrFail(Instrument, { code: 'IND-01' });

  for (const demo of DEMO_LOTS) {
    const spec = await em.findOneOrFail(Spec, { partNumber: demo.partNumber, revision: demo.revision });
    const lot = await ensureLot(em, {
      lotNumber: demo.lotNumber,
      spec,
      grindDate: addDays(today, -demo.grindDaysAgo),
      serials: demo.parts.map((p) => p.serial),
    });
    if (await em.count(BenchRun, { lot })) continue;
    const inspector = asActor(await em.findOneOrFail(User, { email: demo.inspector }));
    const master = await em.findOneOrFail(MasterGauge, { code: demo.master });
    const run = await inspections.startRun(inspector, {
      lotId: lot.id,
      masterId: master.id,
      instrumentId: indicator.id,
      unit: 'in',
      masterTemperature: 20.4,
      partTemperature: 20.6,
      masterStartReading: 0,
    });
    const stations = planStations(spec.plan);
    for (const demoPart of demo.parts) {
      const part = await em.findOneOrFail(Part, { lot, serial: demoPart.serial });
      const values = 'stations' in demoPart ? demoPart.stations : stations.map((_, i) => demoPart.mean + FACE[i % 5]!);
      await inspections.inspect(inspector, run.id, {
        partId: part.id,
        unit: 'in',
        readings: stations.map((s, i) => ({ station: s.name, reading: Number(values[i]!.toFixed(6)) })),
      });
    }
    await inspections.endRun(inspector, run.id, { unit: 'in', masterEndReading: demo.masterEnd });
    for (const [serial, kind, reason] of DECISIONS.filter(([serial]) => demo.parts.some((p) => p.serial === serial))) {
      const part = await em.findOneOrFail(Part, { lot, serial });
      if (kind === 'release') await parts.release(engineer, part.id, {});
      else await parts.dispose(engineer, part.id, { kind, reason });
    }
  }
}

export function asActor(user: User): SessionUser {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    roles: user.roles,
    displayUnit: user.displayUnit,
  };
}
