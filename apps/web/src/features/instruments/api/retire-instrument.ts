import { instrumentSchema, type Instrument, type RetireInput } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

export function retireInstrument(instrumentId: string, input: RetireInput): Promise<Instrument> {
  return apiWrite('POST', `/instruments/${encodeURIComponent(instrumentId)}/retire`, input, instrumentSchema);
}
