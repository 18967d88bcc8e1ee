import { pageOf, specSchema, type Page, type Spec } from '@evenset/contracts';
import { apiKey, useApi } from '../../../lib/swr';
import { SPECS_PATH } from './get-specs';

const revisionsSchema = pageOf(specSchema);

/** Every revision of one part number (the list search matches part numbers; exact matches are kept). */
export function useSpecRevisions(partNumber: string) {
  const answer = useApi<Page<Spec>>(
    apiKey(SPECS_PATH, revisionsSchema, { q: partNumber, pageSize: 100, page: 0, sort: 'revision:asc' }),
  );
  return { ...answer, revisions: answer.data?.items.filter((spec) => spec.partNumber === partNumber) ?? [] };
}
