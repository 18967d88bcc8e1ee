import type { InstrumentKind } from '@evenset/contracts';

export const INSTRUMENT_KIND_LABELS: Record<InstrumentKind, string> = {
  indicator: 'Indicator',
  'height-gauge': 'Height gauge',
  'electronic-probe': 'Electronic probe',
  other: 'Other',
};
