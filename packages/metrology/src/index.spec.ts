import * as metrology from './index';

// The public API named in the issue must be reachable from the package root.
describe('package root', () => {
  it('exports every computation of the public API as a function', () => {
    const names = [
      'toMillimetres',
      'fromMillimetres',
      'formatLength',
      'formatInchTrade',
      'displayResolution',
      'flatness',
      'flatnessOfArrays',
      'parallelism',
      'runout',
      'totalRunout',
      'comparatorHeight',
      'combineUncertainty',
      'decide',
      'heightUncertaintyBudget',
      'setSpread',
      'interchangeWindow',
      'interchangeWindowDetail',
      'buildSets',
      'grindPlan',
      'stockToRemove',
      'chartConstants',
      'xbarR',
      'individuals',
      'capability',
      'runRules',
      'gaugeRR',
      'oneWayAnova',
      'studentTQuantile',
    ] as const;
    for (const name of names) expect(typeof metrology[name]).toBe('function');
    expect(metrology.REFERENCE_TEMPERATURE).toBe(20);
  });
});
