import { calibrationFormSchema } from './masters.schema';
import { specDefinitionSchema } from './specs.schema';

const base = {
  unit: 'mm',
  title: 'Locating ring',
  materialId: '00000000-0000-4000-8000-000000000000',
  displayUnit: 'mm',
  nominal: 12,
  band: { lower: -0.005, upper: 0 },
  matchingBand: 0.003,
  setSize: 1,
  heightStatistic: 'mean',
  decisionRule: 'simple',
  plan: {
    stations: [
      { name: 'N', x: 0, y: 40 },
      { name: 'E', x: 40, y: 0 },
      { name: 'S', x: 0, y: -40 },
    ],
  },
};

/** The field paths a definition is refused on, empty when it is accepted. */
const refusals = (override: object) =>
  specDefinitionSchema.safeParse({ ...base, ...override }).error?.issues.map((i) => i.path.join('.')) ?? [];

describe('specDefinitionSchema', () => {
  it('accepts a plain definition and fills the empty lists of the plan', () => {
    const parsed = specDefinitionSchema.parse(base);
    expect(parsed.plan.datumStations).toEqual([]);
    expect(parsed.plan.runoutCircles).toEqual([]);
  });

  it('refuses cross-field mistakes on the field at fault', () => {
    expect(refusals({ band: { lower: -20, upper: 0 } })).toEqual(['band.lower']); // height ≤ 0
    expect(refusals({ heightStation: 'N' })).toEqual(['heightStation']); // only with 'station'
    expect(refusals({ heightStatistic: 'station' })).toEqual(['heightStation']);
    expect(refusals({ heightStatistic: 'station', heightStation: 'E' })).toEqual([]);
    expect(
      refusals({
        parallelism: 0.003,
        plan: { ...base.plan, datumStations: [{ name: 'D1', x: 0, y: 0 }] },
      }),
    ).toEqual(['plan.datumStations']);
    expect(refusals({ plan: { ...base.plan, datumStations: [{ name: 'N', x: 0, y: 0 }] } })).toEqual([
      'plan.datumStations.0.name',
    ]);
    expect(
      refusals({ grinding: { roughDepth: 0.02, finishAllowance: 0.005, finishDepth: 0.01, sparkOutPasses: 2 } }),
    ).toEqual(['grinding.finishDepth']);
    expect(refusals({ flatness: 0 })).toEqual(['flatness']);
  });
});

describe('calibrationFormSchema', () => {
  const form = {
    calibratedOn: '2026-11-01',
    dueOn: '2027-11-01',
    unit: 'in',
    calibratedSize: '1.500004',
    expandedUncertainty: '0.000003',
    certificateNumber: 'KW-1',
  };

  it('reads numbers sent as form text and defaults k to 2', () => {
    expect(calibrationFormSchema.parse(form)).toMatchObject({ calibratedSize: 1.500004, coverageFactor: 2 });
  });

  it('wants a reason with a correction and a correction with a reason', () => {
    const id = '00000000-0000-4000-8000-000000000000';
    const paths = (extra: object) =>
      calibrationFormSchema.safeParse({ ...form, ...extra }).error?.issues.map((i) => i.path.join('.'));
    expect(paths({ supersedesId: id })).toEqual(['reason']);
    expect(paths({ reason: 'Typo on the certificate' })).toEqual(['supersedesId']);
    expect(paths({ supersedesId: id, reason: 'Typo on the certificate' })).toBeUndefined();
    expect(paths({ dueOn: '2026-10-01' })).toEqual(['dueOn']);
    expect(paths({ calibratedOn: '01/11/2026' })).toEqual(['calibratedOn']);
  });
});
