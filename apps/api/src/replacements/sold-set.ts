import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { HeightWindow } from '@evenset/metrology';
import { NotFoundException } from '../common/errors/domain.exception';
import { toMm } from '../common/units/lengths';
import { FreeStock, type FreeStockPart } from '../sets/free-stock';
import { MatchedSet } from '../sets/matched-set.entity';
import { SetMember } from '../sets/set-member.entity';
import { latestRevision } from '../specs/spec-revision';
import type { Spec } from '../specs/spec.entity';
import { inWindow } from '../sets/window';
import { replacementWindow, type ReplacementWindow } from './replacement-window';

/** A sold set with what a replacement for it must meet. */
export interface SoldSet {
  set: MatchedSet;
  members: SetMember[];
  /** The spec revision of the set's parts (the latest when they differ). */
  spec: Spec;
  tolerance: HeightWindow & { nominal: number };
  window: ReplacementWindow;
}

/** A released part that no set holds, with its current height. */
export type FreePart = FreeStockPart;

/** Reads sold sets, their replacement windows and the free released stock that could match them. */
@Injectable()
export class SoldSets {
  constructor(
    private readonly em: EntityManager,
    private readonly stock: FreeStock,
  ) {}

  async get(id: string): Promise<SoldSet> {
    const set = await this.em.findOne(MatchedSet, { id });
    if (!set) throw new NotFoundException('This set');
    return this.of(set);
  }

  async of(set: MatchedSet): Promise<SoldSet> {
    const members = await this.em.find(
      SetMember,
      { set },
      { populate: ['part.lot'], orderBy: { position: 'asc', id: 'asc' } },
    );
    const spec = latestRevision(members.map((m) => m.part.lot.spec))!;
    const tolerance = {
      nominal: spec.nominalMm,
      low: toMm(spec.nominalMm + spec.bandLowerMm, 'mm'),
      high: toMm(spec.nominalMm + spec.bandUpperMm, 'mm'),
    };
    const window = replacementWindow(
      members.map((m) => m.heightMm),
      set.matchingBandMm,
      tolerance,
      spec.displayUnit,
    );
    return { set, members, spec, tolerance, window };
  }

  /** Released parts of a part number that are in no set (or only `partId`), with their current heights. */
  freeParts(partNumber: string, partId?: string): Promise<FreePart[]> {
    return this.stock.of(partNumber, partId ? [partId] : undefined);
  }

  /** Free released parts inside the window, closest to its centre first (ties by serial). */
  static fits(parts: FreePart[], sold: SoldSet): FreePart[] {
    const { window, centre } = sold.window;
    if (!window || centre === null) return [];
    return parts.filter((p) => inWindow(window, p.height)).sort(byDistanceTo(centre));
  }

  /** Free released parts above the window: grinding can bring them down into it. Closest first. */
  static grindable(parts: FreePart[], sold: SoldSet): FreePart[] {
    const { window, centre } = sold.window;
    if (!window || centre === null) return [];
    return parts.filter((p) => p.height > window.high && !inWindow(window, p.height)).sort(byDistanceTo(centre));
  }
}

/** |height − centre| at the stored scale, so equal distances tie exactly and fall back to the serial. */
export function distance(height: number, centre: number): number {
  return toMm(Math.abs(height - centre), 'mm');
}

function byDistanceTo(centre: number) {
  return (a: FreePart, b: FreePart) =>
    distance(a.height, centre) - distance(b.height, centre) || (a.serial < b.serial ? -1 : a.serial > b.serial ? 1 : 0);
}
