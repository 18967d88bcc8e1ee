import { CERTIFICATE_FORMAT, type CertificateFacts, type Verdict } from '@evenset/contracts';
import type { Inspection } from '../inspections/inspection.entity';
import type { InspectionResult } from '../inspections/inspection-result.entity';
import type { MasterCalibration } from '../masters/master-calibration.entity';
import type { MatchedSet } from '../sets/matched-set.entity';
import type { SetMember } from '../sets/set-member.entity';
import { celsiusText, lengthPair, toUnits } from './decimal-text';

export const ACCREDITATION_STATEMENT =
  'This certificate of conformance reports our own inspection of the parts named in it. It is not an accredited calibration certificate.';

export const UNCERTAINTY_STATEMENT =
  'Each expanded uncertainty U is the combined standard uncertainty of the height multiplied by the coverage factor k shown, evaluated after JCGM 100:2008 (GUM); with k = 2 the interval ±U covers about 95 % of the values that could reasonably be attributed to the height.';

const DECISION_RULES = {
  simple:
    'Simple acceptance: a height conforms when the measured value lies inside the tolerance band; the expanded uncertainty is stated beside it and is not subtracted from the band.',
  guarded:
    'Guarded acceptance (after ISO 14253-1): a height conforms only when the measured value lies inside the tolerance band shrunk at each end by its expanded uncertainty U; a value between the shrunk band and the band is reported as in the guard band, never as conforming.',
} as const;

const VERDICT_WORDS: Record<Verdict, string> = {
  conforms: 'Conforms',
  'does-not-conform': 'Does not conform',
  'guard-band': 'In guard band',
};

/** One member of the set with the records its certificate line is made from. */
export interface MemberRecord {
  member: SetMember;
  inspection: Inspection;
  result: InspectionResult;
  calibration: MasterCalibration;
}

export interface FactsSource {
  certificateNumber: string;
  verificationCode: string;
  verifyUrl: string;
  issuedAt: Date;
  issuer: string;
  shop: { name: string; address: string };
  set: MatchedSet;
  members: MemberRecord[];
  /** For a replacement: the members of the set it matches. */
  replaced: SetMember[] | null;
}

/** The facts a certificate freezes, every length a decimal string in the spec's unit and mm. */
export function composeFacts(source: FactsSource): CertificateFacts {
  const { set, members } = source;
  const specs = members.map((m) => m.member.part.lot.spec);
  const spec = specs[0];
  if (!spec) throw new Error('A certificate needs at least one member.');
  const unit = spec.displayUnit;
  const revisions = [...new Set(specs.map((s) => s.revision))].sort();
  const heights = members.map((m) => toUnits(m.result.heightMm));
  const spread = heights.reduce((a, b) => (b > a ? b : a)) - heights.reduce((a, b) => (b < a ? b : a));
  const band = toUnits(set.matchingBandMm);

  const masters = new Map<string, CertificateFacts['masters'][number]>();
  for (const { inspection, calibration } of members)
    masters.set(calibration.id, {
      code: inspection.run.master.code,
      description: inspection.run.master.description,
      calibrationCertificate: calibration.certificateNumber,
      calibratedOn: calibration.calibratedOn,
      dueOn: calibration.dueOn,
    });

  return {
    format: CERTIFICATE_FORMAT,
    certificateNumber: source.certificateNumber,
    verificationCode: source.verificationCode,
    verifyUrl: source.verifyUrl,
    issuedAt: source.issuedAt.toISOString(),
    issuedOn: source.issuedAt.toISOString().slice(0, 10),
    issuer: source.issuer,
    shop: source.shop,
    customer: { name: set.order.customer.name, orderReference: set.order.reference },
    part: {
      partNumber: set.partNumber,
      specRevision: revisions.join(', '),
      title: spec.title,
      unit,
      nominal: lengthPair(toUnits(spec.nominalMm), unit, 'height'),
      bandLower: lengthPair(toUnits(spec.nominalMm) + toUnits(spec.bandLowerMm), unit, 'height'),
      bandUpper: lengthPair(toUnits(spec.nominalMm) + toUnits(spec.bandUpperMm), unit, 'height'),
    },
    set: {
      setNumber: set.setNumber,
      kind: set.kind,
      spread: lengthPair(spread, unit, 'height'),
      matchingBand: lengthPair(band, unit, 'height'),
      withinBand: spread <= band,
    },
    members: members.map(({ member, inspection, result }, i) => ({
      position: member.position,
      serial: member.part.serial,
      lotNumber: member.part.lot.lotNumber,
      height: lengthPair(heights[i]!, unit, 'height'),
      expandedUncertainty: lengthPair(toUnits(result.expandedUncertaintyMm), unit, 'uncertainty'),
      coverageFactor: String(result.computed.coverageFactor),
      inspectedOn: inspection.createdAt.toISOString().slice(0, 10),
      partTemperature: celsiusText(inspection.partTemperatureC),
      masterTemperature: celsiusText(inspection.masterTemperatureC),
      master: inspection.run.master.code,
      verdict: VERDICT_WORDS[result.verdict],
    })),
    replaces:
      set.kind === 'replacement' && set.replacesSet && source.replaced
        ? {
            setNumber: set.replacesSet.setNumber,
            members: source.replaced.map((m) => ({
              serial: m.part.serial,
              height: lengthPair(toUnits(m.heightMm), unit, 'height'),
            })),
          }
        : null,
    masters: [...masters.values()].sort((a, b) => a.code.localeCompare(b.code)),
    decisionRule: { kind: spec.decisionRule, text: DECISION_RULES[spec.decisionRule] },
    uncertaintyStatement: UNCERTAINTY_STATEMENT,
    accreditationStatement: ACCREDITATION_STATEMENT,
  };
}
