import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import { interchangeWindowDetail, type HeightWindow } from '@evenset/metrology';
import type { Interchange, WindowSummary } from '@evenset/contracts';
import { NotFoundException } from '../common/errors/domain.exception';
import { Spec } from '../specs/spec.entity';
import { MatchedSet } from './matched-set.entity';
import { SetMember } from './set-member.entity';

/** A set sold earlier, as the window sees it. */
export interface SoldSet {
  id: string;
  setNumber: string;
  customerName: string;
  heights: number[];
}

/** Where new parts of a part number must fall: the window, or why there is none. */
export interface WindowState {
  /** Null when nothing is sold yet or when sold sets disagree. */
  window: HeightWindow | null;
  /** True when sold sets leave no common height. */
  conflict: boolean;
  conflicting: SoldSet[];
  /** How many sold sets the window comes from. */
  soldSets: number;
}

/**
 * The interchange window of a part number (brief, "Matching"): the heights a new part may have
 * and still match every set sold earlier within the matching band — computed by
 * `interchangeWindowDetail` over the sold sets' allocated heights. Replacement parts are not sets
 * of their own and do not narrow it.
 */
@Injectable()
export class InterchangeService {
  constructor(private readonly em: EntityManager) {}

  /** The spec revision that governs a part number now: the newest released (or, failing that, superseded) one. */
  async specOf(partNumber: string, em: EntityManager = this.em): Promise<Spec> {
    const spec = await em.findOne(
      Spec,
      { partNumber, status: { $ne: 'draft' } },
      { orderBy: [{ status: 'asc' }, { createdAt: 'desc' }] },
    );
    if (!spec) throw new NotFoundException(`A released spec of ${partNumber}`);
    return spec;
  }

  async soldSets(partNumber: string, em: EntityManager = this.em): Promise<SoldSet[]> {
    const sets = await em.find(MatchedSet, { partNumber, kind: 'set' }, { orderBy: { setNumber: 'asc' } });
    const members = await em.find(SetMember, { set: { $in: sets } });
    return sets.map((set) => ({
      id: set.id,
      setNumber: set.setNumber,
      customerName: set.order.customer.name,
      heights: members.filter((m) => m.set.id === set.id).map((m) => m.heightMm),
    }));
  }

  async state(partNumber: string, em: EntityManager = this.em): Promise<WindowState & { band: number }> {
    const band = (await this.specOf(partNumber, em)).matchingBandMm;
    return { ...windowOf(await this.soldSets(partNumber, em), band), band };
  }

  /** The window as a lot or part shows it, and a test of one height against it. */
  async summary(
    partNumber: string,
  ): Promise<{ summary: WindowSummary; outside: (height: number | null) => boolean | null }> {
    const state = await this.state(partNumber);
    return {
      summary: { window: state.window, conflict: state.conflict, soldSets: state.soldSets },
      outside: (height) => (height === null || state.soldSets === 0 ? null : !insideWindow(state, height)),
    };
  }

  async view(partNumber: string): Promise<Interchange> {
    const spec = await this.specOf(partNumber);
    const band = spec.matchingBandMm;
    const sold = await this.soldSets(partNumber);
    const { window, conflicting } = windowOf(sold, band);
    return {
      partNumber,
      matchingBand: band,
      displayUnit: spec.displayUnit,
      soldSets: sold.map((s) => ({
        id: s.id,
        setNumber: s.setNumber,
        customerName: s.customerName,
        low: Math.min(...s.heights),
        high: Math.max(...s.heights),
        window: { low: Math.max(...s.heights) - band, high: Math.min(...s.heights) + band },
      })),
      window,
      conflicting: conflicting.map((s) => ({ id: s.id, setNumber: s.setNumber })),
      explanation: explain(sold, conflicting, window),
    };
  }
}

/** The window over sold sets, with the sets that conflict when there is none. */
export function windowOf(sold: readonly SoldSet[], band: number): WindowState {
  const counted = sold.filter((s) => s.heights.length > 0);
  if (!counted.length) return { window: null, conflict: false, conflicting: [], soldSets: 0 };
  const detail = interchangeWindowDetail(
    counted.map((s) => s.heights),
    band,
  );
  return {
    window: detail.window,
    conflict: detail.window === null,
    conflicting: detail.conflictingSets.map((i) => counted[i]!),
    soldSets: counted.length,
  };
}

/** True when `height` may join sets sold before (never when they disagree). */
export function insideWindow(state: WindowState, height: number): boolean {
  return !state.conflict && inWindow(state.window, height);
}

/** True when `height` lies in `window`; a null window (nothing sold yet) holds every height. */
export function inWindow(window: HeightWindow | null, height: number): boolean {
  if (!window) return true;
  const slack = 1e-9; // heights are stored to 1e-7 mm; this only absorbs binary noise
  return height >= window.low - slack && height <= window.high + slack;
}

function explain(sold: readonly SoldSet[], conflicting: readonly SoldSet[], window: HeightWindow | null): string {
  if (!sold.length)
    return 'No sets of this part number have been sold yet, so any height within the tolerance band can go into a set.';
  if (window)
    return `A new part must match each of the ${sold.length} set${sold.length > 1 ? 's' : ''} sold before within the matching band.`;
  return `The sets sold before already disagree: no height matches all of them within the matching band. ${conflicting
    .map((s) => s.setNumber)
    .join(', ')} cannot all be matched by one part. Engineering needs to decide how to treat this part number.`;
}
