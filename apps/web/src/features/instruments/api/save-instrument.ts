import { instrumentSchema, type Instrument, type InstrumentInput } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

/** Adds an instrument, or changes the one with `instrumentId`. */
export function saveInstrument(instrumentId: string | null, input: InstrumentInput): Promise<Instrument> {
  return instrumentId
    ? apiWrite('PUT', `/instruments/${encodeURIComponent(instrumentId)}`, input, instrumentSchema)
    : apiWrite('POST', '/instruments', input, instrumentSchema);
}
