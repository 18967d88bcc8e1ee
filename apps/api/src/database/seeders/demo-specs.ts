import type { SpecDefinition } from '@evenset/contracts';
import { MM_PER_INCH } from '../../common/units/lengths';

type DemoDefinition = Omit<SpecDefinition, 'materialId'>;

/** Station positions are drawn in millimetres; an inch spec states them in inches. */
const inches = (mm: number) => mm / MM_PER_INCH;

/** RB-40 riser block, 40 mm × 40 mm top face, 1.5000 in high; sold in sets of 4. Invented. */
export const RB40_REV_B: DemoDefinition = {
  unit: 'in',
  title: 'Riser block 40 × 40 mm, 1.5000 in high',
  displayUnit: 'in',
  nominal: 1.5,
  band: { lower: -0.0004, upper: 0 },
  matchingBand: 0.0002,
  flatness: 0.0001,
  parallelism: 0.0002,
  runout: null,
  setSize: 4,
  heightStatistic: 'mean',
  heightStation: null,
  decisionRule: 'guarded',
  grinding: { roughDepth: 0.001, finishAllowance: 0.0004, finishDepth: 0.0001, sparkOutPasses: 2 },
  masterDriftLimit: null,
  plan: {
    // 5 mm in from each edge, then the centre.
    stations: [
      { name: 'P1', x: inches(5), y: inches(5) },
      { name: 'P2', x: inches(35), y: inches(5) },
      { name: 'P3', x: inches(35), y: inches(35) },
      { name: 'P4', x: inches(5), y: inches(35) },
      { name: 'P5', x: inches(20), y: inches(20) },
    ],
    datumStations: [],
    runoutCircles: [],
  },
};

/** Rev A had a wider band and no centre station; rev B tightened it. */
export const RB40_REV_A: DemoDefinition = {
  ...RB40_REV_B,
  band: { lower: -0.0005, upper: 0 },
  matchingBand: 0.0003,
  flatness: 0.00015,
  decisionRule: 'simple',
  plan: { ...RB40_REV_B.plan, stations: RB40_REV_B.plan.stations.slice(0, 4) },
};

/** PP-6 precision parallels, 6 × 1 × 0.5 in, sold in pairs; stations along the 6 in top edge. */
export const PP6_REV_A: DemoDefinition = {
  unit: 'in',
  title: 'Precision parallels 6 × 1 × 0.5 in',
  displayUnit: 'in',
  nominal: 1,
  band: { lower: -0.0002, upper: 0.0002 },
  matchingBand: 0.0001,
  // Stations on one line: straightness, not flatness, is what a narrow parallel can show.
  flatness: null,
  parallelism: 0.0002,
  runout: null,
  setSize: 2,
  heightStatistic: 'highest',
  heightStation: null,
  decisionRule: 'simple',
  // Parallels are finished in light passes (from memory: shop habit, not a handbook figure).
  grinding: { roughDepth: 0.0005, finishAllowance: 0.0002, finishDepth: 0.00005, sparkOutPasses: 2 },
  masterDriftLimit: 0.00005,
  plan: {
    stations: [0.5, 1.75, 3, 4.25, 5.5].map((x, i) => ({ name: `L${i + 1}`, x, y: 0.25 })),
    datumStations: [],
    runoutCircles: [],
  },
};

/** LR-90 locating ring, 90 mm outside diameter, 12 mm high; runout of the outside diameter. */
export const LR90_REV_A: DemoDefinition = {
  unit: 'mm',
  title: 'Locating ring Ø90 mm, 12 mm high',
  displayUnit: 'mm',
  nominal: 12,
  band: { lower: -0.005, upper: 0 },
  matchingBand: 0.003,
  flatness: 0.002,
  parallelism: 0.003,
  runout: 0.005,
  setSize: 1,
  heightStatistic: 'mean',
  heightStation: null,
  decisionRule: 'guarded',
  grinding: null,
  masterDriftLimit: null,
  plan: {
    // Four points on the face at radius 40 mm, centre of the ring at (0, 0).
    stations: [
      { name: 'N', x: 0, y: 40 },
      { name: 'E', x: 40, y: 0 },
      { name: 'S', x: 0, y: -40 },
      { name: 'W', x: -40, y: 0 },
    ],
    datumStations: [],
    runoutCircles: [{ name: 'OD', radius: 45, positions: 8 }],
  },
};
