import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { FreePart } from '@evenset/contracts';
import { PartStatusService } from '../lots/part-status';
import { Part } from '../lots/part.entity';
import { SetMember } from './set-member.entity';

/** A released part in no set, with the result its height comes from. */
export interface FreeStockPart extends FreePart {
  resultId: string;
}

/** Released parts no set holds yet: what sets and replacements are made from. */
@Injectable()
export class FreeStock {
  constructor(
    private readonly em: EntityManager,
    private readonly states: PartStatusService,
  ) {}

  /** Free released parts of a part number (or only those among `partIds`), ascending height. */
  async of(partNumber: string, partIds?: string[]): Promise<FreeStockPart[]> {
    const candidates = await this.em.find(
      Part,
      { partNumber, ...(partIds ? { id: { $in: partIds } } : {}) },
      { populate: ['lot'] },
    );
    const taken = new Set(
      (await this.em.find(SetMember, { part: { $in: candidates } }, { fields: ['part'] })).map((m) => m.part.id),
    );
    const parts = candidates.filter((p) => !taken.has(p.id));
    return (await this.states.states(parts))
      .flatMap((s) =>
        s.status === 'released' && s.result
          ? [
              {
                id: s.part.id,
                serial: s.part.serial,
                lotNumber: s.part.lot.lotNumber,
                revision: s.part.lot.spec.revision,
                height: s.result.heightMm,
                resultId: s.result.id,
              },
            ]
          : [],
      )
      .sort((a, b) => a.height - b.height || a.serial.localeCompare(b.serial));
  }
}
