import type { MasterCalibration } from './master-calibration.entity';

/** The calibration in force: the latest by date among those no correction superseded. */
export function currentOf(calibrations: MasterCalibration[]): MasterCalibration | null {
  const superseded = new Set(calibrations.flatMap((c) => (c.supersedes ? [c.supersedes.id] : [])));
  const standing = calibrations.filter((c) => !superseded.has(c.id));
  standing.sort(
    (a, b) => b.calibratedOn.localeCompare(a.calibratedOn) || b.createdAt.getTime() - a.createdAt.getTime(),
  );
  return standing[0] ?? null;
}
