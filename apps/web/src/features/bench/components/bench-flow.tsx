import {
  lotDetailSchema,
  masterDetailSchema,
  specSchema,
  type DisplayUnit,
  type Inspection,
  type PartRow,
  type Run,
} from '@evenset/contracts';
import { displayResolution, toMillimetres } from '@evenset/metrology';
import { useState } from 'react';
import { apiGet } from '../../../lib/api-client';
import { useRevalidateLots } from '../../lots/api/get-lots';
import { endRun, startRun } from '../api/runs';
import { benchContext, type BenchContext } from '../bench-context';
import type { LiveResult } from '../live-result';
import { BenchSetup, type BenchSetupInput } from './bench-setup';
import { CsvUploadDialog } from './csv-upload-dialog';
import { MasterCheck } from './master-check';
import { PartPicker } from './part-picker';
import { PartReadings } from './part-readings';
import { PartSaved } from './part-saved';
import { RunEnded } from './run-ended';

type Step =
  | { kind: 'setup' }
  | { kind: 'zero'; setup: BenchSetupInput }
  | { kind: 'part'; context: BenchContext; uploading?: boolean }
  | { kind: 'readings'; context: BenchContext; part: PartRow }
  | { kind: 'saved'; context: BenchContext; inspection: Inspection; live: LiveResult }
  | { kind: 'end'; context: BenchContext }
  | { kind: 'ended'; run: Run };

async function loadContext(run: Run): Promise<BenchContext> {
  const [lot, spec, master] = await Promise.all([
    apiGet(`/lots/${encodeURIComponent(run.lot.id)}`, lotDetailSchema),
    apiGet(`/specs/${encodeURIComponent(run.spec.id)}`, specSchema),
    apiGet(`/masters/${encodeURIComponent(run.master.id)}`, masterDetailSchema),
  ]);
  return benchContext(run, lot, spec, master);
}

/** A run at the Bench, one task per screen: set-up, zero, each part, the end check. */
export function BenchFlow({ unit }: { unit: DisplayUnit }) {
  const [step, setStep] = useState<Step>({ kind: 'setup' });
  const revalidateLots = useRevalidateLots();
  const symbol = displayResolution(unit, 'fine').symbol;
  const toPart = (context: BenchContext) => {
    void revalidateLots();
    setStep({ kind: 'part', context });
  };

  switch (step.kind) {
    case 'setup':
      return <BenchSetup unit={unit} onReady={(setup) => setStep({ kind: 'zero', setup })} />;
    case 'zero':
      return (
        <MasterCheck
          title="Zero on the master"
          text="Set the master on the plate under the indicator, zero it, and key the reading you see (usually 0)."
          unit={symbol}
          onReading={async (reading) => {
            const run = await startRun({ ...step.setup, unit, masterStartReading: reading });
            toPart(await loadContext(run));
          }}
        />
      );
    case 'part':
      return (
        <>
          <PartPicker
            lotId={step.context.lot.id}
            lotNumber={step.context.lot.lotNumber}
            onPart={(part) => setStep({ kind: 'readings', context: step.context, part })}
            onUpload={() => setStep({ ...step, uploading: true })}
            onEnd={() => setStep({ kind: 'end', context: step.context })}
          />
          {step.uploading ? (
            <CsvUploadDialog
              runId={step.context.run.id}
              unit={unit}
              onClose={(imported) => {
                if (imported) void revalidateLots();
                setStep({ kind: 'part', context: step.context });
              }}
            />
          ) : null}
        </>
      );
    case 'readings':
      return (
        <PartReadings
          key={step.part.id}
          context={step.context}
          part={step.part}
          unit={unit}
          onSaved={(inspection, live) => setStep({ kind: 'saved', context: step.context, inspection, live })}
        />
      );
    case 'saved':
      return (
        <PartSaved
          inspection={step.inspection}
          live={step.live}
          unit={unit}
          resolution={toMillimetres(displayResolution(unit, 'fine').step, unit)}
          onNext={() => toPart(step.context)}
          onEnd={() => setStep({ kind: 'end', context: step.context })}
        />
      );
    case 'end':
      return (
        <MasterCheck
          title="Master check at the end"
          text={`Put master ${step.context.master.code} back under the indicator without re-zeroing, and key the reading.`}
          unit={symbol}
          onReading={async (reading) => {
            const run = await endRun(step.context.run.id, { unit, masterEndReading: reading });
            void revalidateLots();
            setStep({ kind: 'ended', run });
          }}
        />
      );
    case 'ended':
      return <RunEnded run={step.run} unit={unit} onNewRun={() => setStep({ kind: 'setup' })} />;
  }
}
