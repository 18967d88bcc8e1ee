import type { Inspection, PartRow, Spec } from '@evenset/contracts';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { setCsrfToken } from '../../../lib/api-client';
import { installFakeFetch } from '../../../testing/fake-fetch';
import { benchContext } from '../bench-context';
import { PartReadings } from './part-readings';

// Invented demo numbers: a 38.1 mm block, band −0.01/0, a 38.1 mm master zeroed at 0.
const spec = {
  id: 's1',
  partNumber: 'RB-40',
  revision: 'B',
  status: 'released',
  previousId: null,
  material: { id: 'm1', name: 'Tool steel', expansionPerK: 11.5, source: 'demo', confidence: 'firm' },
  definition: {
    unit: 'mm',
    title: 'Riser block',
    materialId: 'm1',
    displayUnit: 'mm',
    nominal: 38.1,
    band: { lower: -0.01, upper: 0 },
    matchingBand: 0.005,
    flatness: 0.003,
    parallelism: null,
    runout: null,
    setSize: 4,
    heightStatistic: 'mean',
    heightStation: null,
    decisionRule: 'simple',
    grinding: null,
    masterDriftLimit: null,
    plan: {
      stations: [
        { name: 'A1', x: -10, y: 10 },
        { name: 'A2', x: 10, y: 10 },
        { name: 'B1', x: -10, y: -10 },
      ],
      datumStations: [],
      runoutCircles: [],
    },
  },
  effectiveMasterDriftLimit: 0.001,
  frozenExpansion: { expansionPerK: 11.5, source: 'demo' },
  releasedAt: '2026-11-01T00:00:00.000Z',
  createdAt: '2026-11-01T00:00:00.000Z',
  updatedAt: '2026-11-01T00:00:00.000Z',
} satisfies Spec;

const run = {
  id: 'r1',
  lot: { id: 'l1', lotNumber: 'L-1' },
  spec: { id: 's1', partNumber: 'RB-40', revision: 'B' },
  master: { id: 'g1', code: 'MG-1', calibrationId: 'c1' },
  instrument: { id: 'i1', code: 'IND-1', resolution: 0.0001 },
  inspector: 'Ana Ruiz',
  masterTemperature: 20,
  partTemperature: 20,
  masterStartReading: 0,
  masterEndReading: null,
  drift: null,
  driftLimit: 0.001,
  flagged: false,
  endedAt: null,
  inspections: 0,
  createdAt: '2026-12-01T08:00:00.000Z',
};

const calibration = {
  id: 'c1',
  calibratedOn: '2026-06-01',
  dueOn: '2027-06-01',
  calibratedSize: 38.1,
  expandedUncertainty: 0.0002,
  coverageFactor: 2,
  certificateNumber: 'CAL-1',
  certificate: { filename: 'c.pdf', contentType: 'application/pdf', sizeBytes: 1 },
  supersedesId: null,
  supersededById: null,
  reason: null,
  recordedBy: 'Eng',
  createdAt: '2026-06-01T00:00:00.000Z',
};

const master = {
  id: 'g1',
  code: 'MG-1',
  description: 'Gauge block 38.1',
  nominal: 38.1,
  material: spec.material,
  status: 'in-service' as const,
  current: calibration,
  retiredAt: null,
  retiredReason: null,
  createdAt: '2026-06-01T00:00:00.000Z',
  calibrations: [calibration],
};

const lot = {
  id: 'l1',
  lotNumber: 'L-1',
  spec: {
    id: 's1',
    partNumber: 'RB-40',
    revision: 'B',
    title: 'Riser block',
    displayUnit: 'mm' as const,
    nominal: 38.1,
    band: { lower: -0.01, upper: 0 },
    matchingBand: 0.005,
    flatness: 0.003,
    parallelism: null,
    runout: null,
    decisionRule: 'simple' as const,
  },
  quantity: 4,
  grindDate: '2026-11-20',
  notes: null,
  partCount: 4,
  createdAt: '2026-11-20T00:00:00.000Z',
  counts: {
    'not-inspected': 4,
    conforms: 0,
    'does-not-conform': 0,
    'guard-band': 0,
    held: 0,
    rework: 0,
    scrap: 0,
    'use-as-is': 0,
    released: 0,
  },
  heightSpread: null,
  interchange: { window: null, conflict: false, soldSets: 0, outsideSerials: [] },
};

const part = { id: 'p1', serial: 'RB40-001' } as PartRow;

function storedInspection(readings: { station: string; reading: number }[]): Inspection {
  const decision = {
    verdict: 'conforms' as const,
    side: null,
    acceptance: { lower: 38.09, upper: 38.1 },
    message: 'Inside.',
  };
  const result = {
    id: 'res1',
    reason: 'inspection',
    masterCalibrationId: 'c1',
    height: 38.0955,
    heightUncorrected: 38.0955,
    combinedUncertainty: 0.0001,
    expandedUncertainty: 0.0002,
    coverageFactor: 2,
    budget: [],
    flatness: null,
    parallelism: null,
    runout: null,
    decisions: { height: decision, flatness: null, parallelism: null, runout: null },
    verdict: 'conforms' as const,
    createdAt: '2026-12-01T08:05:00.000Z',
  };
  return {
    id: 'ins1',
    partId: 'p1',
    serial: 'RB40-001',
    runId: 'r1',
    specId: 's1',
    masterCalibrationId: 'c1',
    instrumentId: 'i1',
    instrumentResolution: 0.0001,
    masterTemperature: 20,
    partTemperature: 20,
    partExpansionPerK: 11.5,
    masterExpansionPerK: 11.5,
    inspector: 'Ana Ruiz',
    runFlagged: false,
    supersedesId: null,
    supersededById: null,
    reason: null,
    readings: readings.map((r) => ({ ...r, kind: 'top' as const })),
    result,
    results: [result],
    createdAt: '2026-12-01T08:05:00.000Z',
  };
}

function renderBench() {
  const requests = installFakeFetch((request) => {
    if (request.url === '/api/auth/csrf') return { status: 200, body: { csrfToken: 't1' } };
    if (request.method === 'POST' && request.url === '/api/runs/r1/inspections') {
      const body = request.body as { readings: { station: string; reading: number }[] };
      return { status: 201, body: storedInspection(body.readings) };
    }
    return { status: 404, body: { code: 'NOT_FOUND', message: 'Not here.' } };
  });
  const onSaved = jest.fn();
  const context = benchContext(run, lot, spec, master);
  render(<PartReadings context={context} part={part} unit="mm" onSaved={onSaved} />);
  return { user: userEvent.setup(), requests, onSaved };
}

const reading = () => screen.getByRole('textbox', { name: /Reading at/ });

beforeEach(() => setCsrfToken(null));

describe('the Bench, keyboard alone', () => {
  it('refuses a value that is not a number in place, and stays on the station', async () => {
    const { user } = renderBench();
    await user.type(reading(), '1.2.3{Enter}');
    expect(screen.getByText(/“1\.2\.3” is not a number/)).toBeInTheDocument();
    expect(screen.getByText('Station A1')).toBeInTheDocument();
  });

  it('clears the current reading with Escape, and with Redo', async () => {
    const { user } = renderBench();
    await user.type(reading(), '-0.004');
    await user.keyboard('{Escape}');
    expect(reading()).toHaveValue('');
    await user.type(reading(), '-0.004');
    await user.click(screen.getByRole('button', { name: 'Redo' }));
    expect(reading()).toHaveValue('');
    expect(screen.getByText('Station A1')).toBeInTheDocument();
  });

  it('moves on with Enter and names the next station before it comes', async () => {
    const { user } = renderBench();
    expect(screen.getByText('Next: A2')).toBeInTheDocument();
    await user.type(reading(), '-0.004{Enter}');
    expect(screen.getByText('Station A2')).toBeInTheDocument();
    expect(screen.getByText('Next: B1')).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Live results' })).toHaveTextContent(/38\.0960 mm/);
  });

  it('asks "Are you sure?" of a reading far outside the range: Escape goes back, Enter takes it', async () => {
    const { user } = renderBench();
    await user.type(reading(), '4{Enter}');
    expect(screen.getByRole('alertdialog', { name: 'Are you sure?' })).toBeInTheDocument();
    expect(screen.getByText('Station A1')).toBeInTheDocument();
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument();
    expect(reading()).toHaveValue('4');
    await user.keyboard('{Enter}');
    await user.keyboard('{Enter}');
    expect(screen.getByText('Station A2')).toBeInTheDocument();
  });

  it('saves every reading in plan order after the last station, and hands over the stored result', async () => {
    const { user, requests, onSaved } = renderBench();
    await user.type(reading(), '-0.004{Enter}');
    await user.type(reading(), '-0.005{Enter}');
    await user.type(reading(), '-0.0045{Enter}');
    expect(screen.getByText('All 3 readings taken')).toBeInTheDocument();
    await user.keyboard('{Enter}');
    expect(onSaved).toHaveBeenCalledTimes(1);
    const post = requests.find((r) => r.method === 'POST' && r.url === '/api/runs/r1/inspections');
    expect(post?.body).toEqual({
      partId: 'p1',
      unit: 'mm',
      readings: [
        { station: 'A1', reading: -0.004 },
        { station: 'A2', reading: -0.005 },
        { station: 'B1', reading: -0.0045 },
      ],
    });
  });
});
