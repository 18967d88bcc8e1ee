import { compareFields } from './spec-comparison';
import { latestRevision, nextRevision } from './spec-revision';

describe('nextRevision', () => {
  it('steps through the letters and on to two letters', () => {
    expect(nextRevision('A')).toBe('B');
    expect(nextRevision('B')).toBe('C');
    expect(nextRevision('Z')).toBe('AA');
    expect(nextRevision('AZ')).toBe('BA');
    expect(nextRevision('ZZ')).toBeUndefined();
  });

  it('finds the latest revision, Z before AA', () => {
    const revisions = ['B', 'AA', 'Z', 'A'].map((revision) => ({ revision }));
    expect(latestRevision(revisions)?.revision).toBe('AA');
    expect(latestRevision([])).toBeUndefined();
  });
});

describe('compareFields', () => {
  const before = {
    nominal: 38.1,
    band: { lower: -0.01016, upper: 0 },
    flatness: null,
    plan: {
      stations: [
        { name: 'C1', x: 5, y: 5 },
        { name: 'C2', x: 35, y: 5 },
      ],
    },
  };

  it('names each changed field by its dotted path, stations by name', () => {
    const after = {
      nominal: 38.1,
      band: { lower: -0.00762, upper: 0 },
      flatness: 0.00254,
      plan: {
        stations: [
          { name: 'C1', x: 5, y: 5 },
          { name: 'C2', x: 34, y: 5 },
          { name: 'M', x: 20, y: 20 },
        ],
      },
    };
    expect(compareFields(before, after)).toEqual([
      { field: 'band.lower', before: -0.01016, after: -0.00762 },
      { field: 'flatness', before: null, after: 0.00254 },
      { field: 'plan.stations', before: 'C1, C2', after: 'C1, C2, M' },
      { field: 'plan.stations.C2.x', before: 35, after: 34 },
      { field: 'plan.stations.M.x', before: null, after: 20 },
      { field: 'plan.stations.M.y', before: null, after: 20 },
    ]);
  });

  it('finds nothing between equal definitions', () => {
    expect(compareFields(before, structuredClone(before))).toEqual([]);
  });
});
