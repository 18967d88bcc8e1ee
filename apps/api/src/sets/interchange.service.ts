import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { HeightWindow } from '@evenset/metrology';
import type { Interchange, WindowSummary } from '@evenset/contracts';
import { NotFoundException } from '../common/errors/domain.exception';
import { Spec } from '../specs/spec.entity';
import { MatchedSet } from './matched-set.entity';
import { SetMember } from './set-member.entity';
import { insideWindow, windowOf, type SoldSet, type WindowState } from './window';

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

function explain(sold: readonly SoldSet[], conflicting: readonly SoldSet[], window: HeightWindow | null): string {
  if (!sold.length)
    return 'No sets of this part number have been sold yet, so any height within the tolerance band can go into a set.';
  if (window)
    return `A new part must match each of the ${sold.length} set${sold.length > 1 ? 's' : ''} sold before within the matching band.`;
  return `The sets sold before already disagree: no height matches all of them within the matching band. ${conflicting
    .map((s) => s.setNumber)
    .join(', ')} cannot all be matched by one part. Engineering needs to decide how to treat this part number.`;
}
