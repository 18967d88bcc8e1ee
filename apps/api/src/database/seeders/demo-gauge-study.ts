import type { EntityManager } from '@mikro-orm/postgresql';
import { AuditService } from '../../audit/audit.service';
import { addDays, todayIso } from '../../common/gauges/gauge-status';
import { toMm } from '../../common/units/lengths';
import { GaugeStudiesService } from '../../gauge-studies/gauge-studies.service';
import { GaugeStudy } from '../../gauge-studies/gauge-study.entity';
import { GaugeStudySlot } from '../../gauge-studies/gauge-study-slot.entity';
import { Part } from '../../lots/part.entity';
import { MasterGauge } from '../../masters/master-gauge.entity';
import { Spec } from '../../specs/spec.entity';
import { User } from '../../users/user.entity';
import { ensureInstrument } from '../factories/instrument.factory';
import { ensureLot } from '../factories/lot.factory';
import { asActor } from './demo-lots';

export const DEMO_GAUGE_STUDY_NAME = 'RB-40 height, three inspectors';

/**
 * Houf & Berman (1988), thermal impedance of 10 parts, each measured 3 times by 3 operators, as
 * printed in Montgomery, Introduction to Statistical Quality Control, §8.7 (the same data set the
 * metrology package's gauge-rr spec checks): values[part][operator][trial].
 */
export const HOUF_BERMAN: number[][][] = `37 38 37 | 41 41 40 | 41 42 41
42 41 43 | 42 42 42 | 43 42 43
30 31 31 | 31 31 31 | 29 30 28
42 43 42 | 43 43 43 | 42 42 42
28 30 29 | 29 30 29 | 31 29 29
42 42 43 | 45 45 45 | 44 46 45
25 26 27 | 28 28 30 | 29 27 27
40 40 40 | 43 42 42 | 43 43 41
25 25 25 | 27 29 28 | 26 26 26
35 34 34 | 35 35 34 | 35 34 35`
  .split('\n')
  .map((line) => line.split('|').map((cell) => cell.trim().split(/\s+/).map(Number)));

/**
 * Each published value v becomes an indicator reading of (v − 50) × 0.00001 in against the RB-40
 * master. One unit is 0.00001 in, so the published spec limits 18 and 58 (40 units) are exactly
 * RB-40 rev B's band of 0.0004 in: every ratio (%GR&R, P/T, ndc) is the published one, and sums of
 * squares, mean squares and variance components are the published ones × (0.00001 in)².
 */
export const DEMO_UNIT_IN = 0.00001;
export const demoReadingIn = (v: number) => Number(((v - 50) * DEMO_UNIT_IN).toFixed(6));

/** The demo's inspectors in the study's order (operators 1, 2, 3 of the published data). */
const APPRAISERS = ['inspector@kestrel.example', 'inspector2@kestrel.example', 'inspector3@kestrel.example'];
const SERIALS = Array.from({ length: 10 }, (_, i) => `RB40-GS${String(i + 1).padStart(2, '0')}`);

/** One completed study on ten reference blocks, measured through the API's own service. Idempotent. */
export async function seedDemoGaugeStudy(em: EntityManager, today = todayIso()): Promise<void> {
  if (await em.count(GaugeStudy, { name: DEMO_GAUGE_STUDY_NAME })) return;
  const spec = await em.findOneOrFail(Spec, { partNumber: 'RB-40', revision: 'B' });
  // Invented: a probe fine enough for a 0.0004 in band (resolution a fortieth of it).
  const probe = await ensureInstrument(em, {
    code: 'EP-01',
    kind: 'electronic-probe',
    description: 'Electronic probe, 0.00001 in, used for gauge studies',
    resolutionMm: toMm(0.00001, 'in'),
    calibrationDueOn: addDays(today, 150),
  });
  await em.flush();
  const lot = await ensureLot(em, {
    lotNumber: 'L-2026-GS1',
    spec,
    grindDate: addDays(today, -20),
    notes: 'Ten RB-40 blocks kept as reference parts for gauge studies; not for sale.',
    serials: SERIALS,
  });
  const parts = await em.find(Part, { lot }, { orderBy: { serial: 'asc' } });
  const master = await em.findOneOrFail(MasterGauge, { code: 'MG-1.500-A' });
  const engineer = asActor(await em.findOneOrFail(User, { email: 'engineer@kestrel.example' }));
  const inspectors = await Promise.all(APPRAISERS.map((email) => em.findOneOrFail(User, { email })));

  const audit = new AuditService(em);
  const studies = new GaugeStudiesService(em, audit);
  const study = await studies.create(
    engineer,
    {
      name: DEMO_GAUGE_STUDY_NAME,
      specId: spec.id,
      partIds: parts.map((p) => p.id),
      inspectorIds: inspectors.map((u) => u.id),
      trials: 3,
      instrumentId: probe.id,
      masterId: master.id,
    },
    20261202,
  );
  const partIndex = new Map(parts.map((p, i) => [p.id, i]));
  // A fresh unit of work per measurement keeps ninety saves quick.
  const fresh = em.fork();
  const measuring = new GaugeStudiesService(fresh, new AuditService(fresh));
  for (const [j, inspector] of inspectors.entries()) {
    const actor = asActor(inspector);
    for (let turn = await measuring.turn(actor, study.id); turn.next;) {
      const slot = await fresh.findOneOrFail(GaugeStudySlot, { id: turn.next.slotId });
      const v = HOUF_BERMAN[partIndex.get(slot.part.id)!]![j]![slot.trial - 1]!;
      turn = await measuring.measure(actor, study.id, { slotId: slot.id, unit: 'in', reading: demoReadingIn(v) });
      fresh.clear();
    }
  }
}
