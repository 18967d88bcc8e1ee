import { addDays, todayIso } from '../../common/gauges/gauge-status';
import { toMm } from '../../common/units/lengths';
import type { Material } from '../../materials/material.entity';
import type { InstrumentSeed } from '../factories/instrument.factory';
import type { MasterSeed } from '../factories/master.factory';

/**
 * Invented masters, dated from today so the demo always shows one in service, one due soon and
 * one overdue. Sizes and uncertainties are demo numbers, not real calibrations.
 */
export function demoMasters(steel: Material, today = todayIso()): MasterSeed[] {
  const day = (n: number) => addDays(today, n);
  return [
    {
      code: 'MG-1.500-A',
      description: '1.5000 in steel master block for RB-40',
      nominalMm: toMm(1.5, 'in'),
      material: steel,
      calibrations: [
        {
          calibratedOn: day(-200),
          dueOn: day(165),
          calibratedSizeMm: 38.10018,
          expandedUncertaintyMm: 0.00007,
          certificateNumber: 'KW-CAL-2026-0412',
        },
        {
          calibratedOn: day(-200),
          dueOn: day(165),
          calibratedSizeMm: 38.10008,
          expandedUncertaintyMm: 0.00007,
          certificateNumber: 'KW-CAL-2026-0412-R1',
          correctionReason: 'Certificate reissued: the calibrated size was mistyped on the first issue.',
        },
      ],
    },
    {
      code: 'MG-1.000-A',
      description: '1.0000 in steel master block for PP-6',
      nominalMm: toMm(1, 'in'),
      material: steel,
      calibrations: [
        {
          calibratedOn: day(-353),
          dueOn: day(12),
          calibratedSizeMm: 25.40006,
          expandedUncertaintyMm: 0.00006,
          certificateNumber: 'KW-CAL-2025-1187',
        },
      ],
    },
    {
      code: 'MG-12-A',
      description: '12 mm steel master block for LR-90',
      nominalMm: 12,
      material: steel,
      calibrations: [
        {
          calibratedOn: day(-370),
          dueOn: day(-5),
          calibratedSizeMm: 12.00004,
          expandedUncertaintyMm: 0.00005,
          certificateNumber: 'KW-CAL-2025-1093',
        },
      ],
    },
  ];
}

export function demoInstruments(today = todayIso()): InstrumentSeed[] {
  return [
    {
      code: 'IND-01',
      kind: 'indicator',
      description: 'Test indicator, 0.0001 in, on the granite stand',
      resolutionMm: toMm(0.0001, 'in'),
      calibrationDueOn: addDays(today, 200),
    },
    {
      code: 'HG-01',
      kind: 'height-gauge',
      description: 'Digital height gauge, 0.001 mm',
      resolutionMm: 0.001,
      calibrationDueOn: addDays(today, 90),
    },
  ];
}
