import useSWR, { useSWRConfig, type SWRConfiguration, type SWRResponse } from 'swr';
import type { ZodType } from 'zod';
import { ApiError, apiGet, type QueryParams } from './api-client';

/**
 * A read request as an SWR key. The schema travels with the key so the one fetcher can check
 * every answer against the contract; SWR hashes the schema by reference, so define it once.
 */
export interface ApiKey<T> {
  readonly path: string;
  readonly schema: ZodType<T>;
  readonly query?: QueryParams | undefined;
}

export function apiKey<T>(path: string, schema: ZodType<T>, query?: QueryParams): ApiKey<T> {
  return { path, schema, query };
}

/** True for every cached answer at or below one of `paths` (a list and its items' pages). */
function isApiKeyUnder(paths: readonly string[], key: unknown): boolean {
  if (typeof key !== 'object' || key === null || !('path' in key) || typeof key.path !== 'string') return false;
  const keyPath = key.path;
  return paths.some((path) => keyPath === path || keyPath.startsWith(`${path}/`));
}

/** Marks stale every cached answer at or below `paths`, after a change there. */
export function useRevalidateUnder(...paths: string[]): () => Promise<unknown> {
  const { mutate } = useSWRConfig();
  return () => mutate((key) => isApiKeyUnder(paths, key));
}

export function swrFetcher<T>(key: ApiKey<T>): Promise<T> {
  return apiGet(key.path, key.schema, key.query);
}

export function useApi<T>(key: ApiKey<T> | null, config?: SWRConfiguration<T, ApiError>): SWRResponse<T, ApiError> {
  return useSWR<T, ApiError>(key, config ?? {});
}

export const swrConfig: SWRConfiguration = {
  fetcher: swrFetcher,
  // Refusals (4xx) will not change by asking again; outages (network, 5xx) may.
  shouldRetryOnError: (error) => !(error instanceof ApiError) || error.status === 0 || error.status >= 500,
  errorRetryCount: 3,
};
