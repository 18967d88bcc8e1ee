import type { Page } from 'playwright-core';
import { baseUrl } from './browser';

/** One row of `GET /api/lots/:id/parts`: the part's current result, lengths in mm. */
export interface ServerPartRow {
  id: string;
  serial: string;
  status: string;
  height: number | null;
  flatness: number | null;
  parallelism: number | null;
  expandedUncertainty: number | null;
  verdict: 'conforms' | 'does-not-conform' | 'guard-band' | null;
  verdicts: Record<string, string | null>;
  runFlagged: boolean;
}

/** Grid fields compared with the server, as the Lot review's parts grid names its columns. */
export const RESULT_FIELDS = ['height', 'flatness', 'parallelism', 'expandedUncertainty', 'verdict'] as const;
export type ResultField = (typeof RESULT_FIELDS)[number];

/** GET through the signed-in page's own session (cookies of its browser context). */
export async function apiGet<T>(page: Page, path: string): Promise<T> {
  const response = await page.request.get(`${baseUrl()}/api${path}`);
  if (!response.ok()) throw new Error(`GET /api${path} answered ${response.status()}: ${await response.text()}`);
  return (await response.json()) as T;
}

/** Every part of a lot as the server stores it, in serial order. */
export async function serverParts(page: Page, lotId: string): Promise<ServerPartRow[]> {
  const answer = await apiGet<{ items: ServerPartRow[]; total: number }>(
    page,
    `/lots/${encodeURIComponent(lotId)}/parts?page=0&pageSize=500&sort=serial:asc`,
  );
  expect(answer.items).toHaveLength(answer.total);
  return answer.items;
}

/**
 * Opens a lot's review and reads the text of the parts grid's cells, by part id (the grid's row
 * id): the lot's parts must all fit on the grid's first page.
 */
export async function reviewGridCells(
  page: Page,
  lotId: string,
  lotNumber: string,
  partIds: readonly string[],
): Promise<Map<string, Record<ResultField, string>>> {
  await page.goto(`${baseUrl()}/lots/${encodeURIComponent(lotId)}`);
  await page.getByRole('heading', { name: `Lot review — ${lotNumber}` }).waitFor();
  const grid = page.getByRole('grid', { name: 'Parts' });
  const cells = new Map<string, Record<ResultField, string>>();
  for (const id of partIds) {
    const row = grid.locator(`[role="row"][data-id="${id}"]`);
    await row.waitFor();
    const texts = {} as Record<ResultField, string>;
    for (const field of RESULT_FIELDS)
      texts[field] = (await row.locator(`[role="gridcell"][data-field="${field}"]`).innerText()).trim();
    cells.set(id, texts);
  }
  return cells;
}
