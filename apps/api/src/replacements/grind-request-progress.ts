import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { GrindRequestDetail, GrindRequestStatus } from '@evenset/contracts';
import { PartStatusService } from '../lots/part-status';
import { GrindRequestStep } from './grind-request-step.entity';
import type { GrindRequest } from './grind-request.entity';
import { inWindow } from '../sets/window';

export interface Progress {
  status: GrindRequestStatus;
  steps: GrindRequestStep[];
  reInspection: GrindRequestDetail['reInspection'];
}

/**
 * Where grind requests stand. Open and ground are recorded steps; re-inspected is read from the
 * Bench: the part's current inspection made after the newest "ground" step.
 */
@Injectable()
export class GrindRequestProgress {
  constructor(
    private readonly em: EntityManager,
    private readonly states: PartStatusService,
  ) {}

  async of(requests: GrindRequest[]): Promise<Map<string, Progress>> {
    if (!requests.length) return new Map();
    const steps = await this.em.find(
      GrindRequestStep,
      { request: { $in: requests } },
      { orderBy: { createdAt: 'asc', id: 'asc' } },
    );
    const states = new Map(
      (await this.states.states([...new Map(requests.map((r) => [r.part.id, r.part])).values()])).map((s) => [
        s.part.id,
        s,
      ]),
    );
    return new Map(
      requests.map((request) => {
        const own = steps.filter((s) => s.request.id === request.id);
        const ground = own.findLast((s) => s.status === 'ground');
        const state = states.get(request.part.id);
        const inspection = state?.inspection;
        const result = state?.result;
        const reInspection =
          ground && inspection && result && inspection.createdAt > ground.createdAt
            ? {
                inspectionId: inspection.id,
                height: result.heightMm,
                verdict: result.verdict,
                insideWindow: inWindow({ low: request.windowLowMm, high: request.windowHighMm }, result.heightMm),
                inspector: inspection.inspectorName,
                inspectedAt: inspection.createdAt.toISOString(),
              }
            : null;
        const status: GrindRequestStatus = reInspection ? 're-inspected' : (own.at(-1)?.status ?? 'open');
        return [request.id, { status, steps: own, reInspection }];
      }),
    );
  }
}
