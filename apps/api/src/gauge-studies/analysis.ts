import { gaugeRR } from '@evenset/metrology';
import { grrVerdict, type GaugeStudyResult } from '@evenset/contracts';

/**
 * The study's analysis from the heights in force, values[part][inspector][trial] in mm. Heights
 * are taken from the nominal first: the ANOVA does not change with a common offset, and small
 * numbers keep the sums of squares clear of rounding. The tolerance is the spec band's width.
 */
export function analyseGaugeStudy(values: number[][][], nominalMm: number, toleranceMm: number): GaugeStudyResult {
  const r = gaugeRR({
    values: values.map((part) => part.map((cell) => cell.map((v) => v - nominalMm))),
    tolerance: toleranceMm,
  });
  const pctGrrOfTolerance = r.pctGrrOfTolerance ?? Number.NaN;
  return {
    anova: r.anova.map((row) => ({ ...row })),
    variance: { ...r.variance },
    repeatability: r.repeatability,
    reproducibility: r.reproducibility,
    grr: r.grr,
    partVariation: r.partVariation,
    totalVariation: r.totalVariation,
    pctGrrOfTotal: r.pctGrrOfTotal,
    pctGrrOfTolerance,
    tolerance: toleranceMm,
    // A study with no gauge spread at all tells every part apart; JSON has no Infinity.
    ndc: Number.isFinite(r.ndc) ? r.ndc : 9999,
    verdictOfTotal: grrVerdict(r.pctGrrOfTotal),
    verdictOfTolerance: grrVerdict(pctGrrOfTolerance),
  };
}
