import { EntityManager } from '@mikro-orm/postgresql';
import { QueryOrder } from '@mikro-orm/core';
import { Injectable } from '@nestjs/common';
import type { Home, SessionUser } from '@evenset/contracts';
import { AuditEntry } from '../audit/audit-entry.entity';
import { auditView } from '../audit/audit-log.service';
import { Certificate } from '../certificates/certificate.entity';
import { gaugeStatus, todayIso } from '../common/gauges/gauge-status';
import { BenchRun } from '../inspections/bench-run.entity';
import { PartStatusService, type PartState } from '../lots/part-status';
import { Part } from '../lots/part.entity';
import { MasterGauge } from '../masters/master-gauge.entity';
import { GrindRequestProgress } from '../replacements/grind-request-progress';
import { GrindRequest } from '../replacements/grind-request.entity';
import { MatchedSet } from '../sets/matched-set.entity';
import { SetsService } from '../sets/sets.service';
import { TrendsService } from '../trends/trends.service';
import { User } from '../users/user.entity';

/** How many recent items a tile lists. */
const RECENT = 5;

type Sections = Required<Home>;

/**
 * What waits for each of the person's roles, read from the records. Part status and grind-request
 * progress are derived the same way the lot review and the grind-request list derive them, so the
 * counts here always agree with the pages the tiles open.
 */
@Injectable()
export class HomeService {
  constructor(
    private readonly em: EntityManager,
    private readonly states: PartStatusService,
    private readonly progress: GrindRequestProgress,
    private readonly sets: SetsService,
    private readonly trends: TrendsService,
  ) {}

  async home(user: SessionUser): Promise<Home> {
    const has = (role: SessionUser['roles'][number]) => user.roles.includes(role);
    // Shared reads, made once even when several sections need them.
    const partStates = has('inspector') || has('engineer') ? this.allPartStates() : null;
    const requests = has('engineer') || has('service') ? this.grindRequests() : null;
    const [inspector, engineer, sales, service, admin] = await Promise.all([
      has('inspector') && partStates ? this.inspector(user, partStates) : undefined,
      has('engineer') && partStates && requests ? this.engineer(partStates, requests) : undefined,
      has('sales') ? this.sales() : undefined,
      has('service') && requests ? this.service(requests) : undefined,
      has('admin') ? this.admin() : undefined,
    ]);
    return { inspector, engineer, sales, service, admin };
  }

  private async allPartStates(): Promise<PartState[]> {
    const parts = await this.em.find(Part, {}, { populate: ['lot'], orderBy: { lot: { lotNumber: 'asc' } } });
    return this.states.states(parts);
  }

  private async grindRequests(): Promise<Sections['service']['openCases']> {
    const requests = await this.em.find(
      GrindRequest,
      {},
      { populate: ['part'], orderBy: { createdAt: QueryOrder.ASC, id: QueryOrder.ASC } },
    );
    const progress = await this.progress.of(requests);
    return requests.flatMap((r) => {
      const status = progress.get(r.id)?.status ?? 'open';
      return status === 're-inspected'
        ? []
        : [
            {
              id: r.id,
              requestNumber: r.requestNumber,
              partNumber: r.part.partNumber,
              serial: r.part.serial,
              status,
              createdAt: r.createdAt.toISOString(),
            },
          ];
    });
  }

  private async inspector(user: SessionUser, statesPromise: Promise<PartState[]>): Promise<Sections['inspector']> {
    const [states, runs] = await Promise.all([
      statesPromise,
      this.em.find(
        BenchRun,
        { inspectorId: user.id },
        { populate: ['lot'], orderBy: { createdAt: QueryOrder.DESC, id: QueryOrder.DESC }, limit: RECENT },
      ),
    ]);
    const counted = runs.length
      ? await this.em.getConnection().execute<{ run_id: string; n: string }[]>(
          `select run_id, count(*) as n from inspection where run_id in (${runs.map(() => '?').join(',')}) group by run_id`,
          runs.map((r) => r.id),
        )
      : [];
    const inspections = new Map(counted.map((row) => [row.run_id, Number(row.n)]));
    return {
      lotsWaiting: perLot(states)
        .map(({ lot, states: own }) => ({
          lotId: lot.id,
          lotNumber: lot.lotNumber,
          partNumber: lot.spec.partNumber,
          notInspected: own.filter((s) => s.status === 'not-inspected').length,
          parts: own.length,
        }))
        .filter((l) => l.notInspected > 0),
      recentRuns: runs.map((run) => ({
        runId: run.id,
        lotId: run.lot.id,
        lotNumber: run.lot.lotNumber,
        partNumber: run.lot.spec.partNumber,
        startedAt: run.createdAt.toISOString(),
        endedAt: run.endedAt?.toISOString() ?? null,
        inspections: inspections.get(run.id) ?? 0,
      })),
    };
  }

  private async engineer(
    statesPromise: Promise<PartState[]>,
    requestsPromise: Promise<Sections['service']['openCases']>,
  ): Promise<Sections['engineer']> {
    const today = todayIso();
    const [states, requests, masters, runRuleSignals] = await Promise.all([
      statesPromise,
      requestsPromise,
      this.em.find(MasterGauge, { retiredAt: null }, { populate: ['currentCalibration'] }),
      this.runRuleSignals(),
    ]);
    const mastersDue = masters
      .flatMap((m) => {
        const dueOn = m.currentCalibration?.dueOn ?? null;
        const status = gaugeStatus(dueOn, today, false);
        return dueOn && (status === 'due-soon' || status === 'overdue')
          ? [{ id: m.id, code: m.code, description: m.description, dueOn, overdue: status === 'overdue' }]
          : [];
      })
      .sort((a, b) => a.dueOn.localeCompare(b.dueOn) || a.code.localeCompare(b.code));
    return {
      awaitingDisposition: perLot(states)
        .map(({ lot, states: own }) => ({
          lotId: lot.id,
          lotNumber: lot.lotNumber,
          partNumber: lot.spec.partNumber,
          doesNotConform: own.filter((s) => s.status === 'does-not-conform').length,
          guardBand: own.filter((s) => s.status === 'guard-band').length,
          held: own.filter((s) => s.status === 'held').length,
        }))
        .filter((l) => l.doesNotConform + l.guardBand + l.held > 0),
      mastersDue,
      runRuleSignals,
      grindRequests: {
        open: requests.filter((r) => r.status === 'open').length,
        ground: requests.filter((r) => r.status === 'ground').length,
      },
    };
  }

  /** The signals the Trends page shows for each released part number, with its default view. */
  private async runRuleSignals(): Promise<Sections['engineer']['runRuleSignals']> {
    const { items } = await this.trends.partNumbers();
    const partNumbers = [...new Set(items.map((p) => p.partNumber))];
    const counts = [];
    // One after another: each trend reads the part number's inspections on the same connection.
    for (const partNumber of partNumbers) {
      const trend = await this.trends.trend(partNumber, { subgroup: 'lot' });
      counts.push({ partNumber, signals: trend.signals.length });
    }
    return counts;
  }

  private async sales(): Promise<Sections['sales']> {
    const [stock, certificates] = await Promise.all([
      this.sets.stockByPartNumber(),
      this.em.find(
        Certificate,
        {},
        { populate: ['set'], orderBy: { createdAt: QueryOrder.DESC, id: QueryOrder.DESC }, limit: RECENT },
      ),
    ]);
    const withSets = await Promise.all(
      stock.map(async (s) => ({
        partNumber: s.partNumber,
        title: s.title,
        setSize: s.setSize,
        displayUnit: s.displayUnit,
        available: s.available,
        // The same choice the set builder makes, so the count is what it would offer.
        sets:
          s.available >= s.setSize ? (await this.sets.propose({ partNumber: s.partNumber, setCount: 1 })).possible : 0,
      })),
    );
    return {
      stock: withSets,
      recentCertificates: certificates.map((c) => ({
        id: c.id,
        certificateNumber: c.certificateNumber,
        setId: c.set.id,
        setNumber: c.set.setNumber,
        partNumber: c.set.partNumber,
        issuedAt: c.createdAt.toISOString(),
      })),
    };
  }

  private async service(requestsPromise: Promise<Sections['service']['openCases']>): Promise<Sections['service']> {
    const [openCases, replacements] = await Promise.all([
      requestsPromise,
      this.em.find(
        MatchedSet,
        { kind: 'replacement' },
        { populate: ['replacesSet'], orderBy: { createdAt: QueryOrder.DESC, id: QueryOrder.DESC }, limit: RECENT },
      ),
    ]);
    return {
      openCases,
      recentReplacements: replacements.map((s) => ({
        id: s.id,
        setNumber: s.setNumber,
        partNumber: s.partNumber,
        replacesSetNumber: s.replacesSet?.setNumber ?? '',
        createdAt: s.createdAt.toISOString(),
      })),
    };
  }

  private async admin(): Promise<Sections['admin']> {
    const [active, inactive, failures, audit] = await Promise.all([
      this.em.count(User, { active: true }),
      this.em.count(User, { active: false }),
      // Same rule as the Outbox page: the newest attempt failed, or none was made yet.
      this.em.getConnection().execute<{ n: string }[]>(
        `select count(*) as n from mail_message m
         where coalesce((select a.outcome from mail_attempt a where a.message_id = m.id
                         order by a.created_at desc, a.id desc limit 1), 'failed') = 'failed'`,
      ),
      this.em.find(AuditEntry, {}, { orderBy: { createdAt: QueryOrder.DESC, id: QueryOrder.DESC }, limit: RECENT }),
    ]);
    return {
      people: { active, inactive },
      outboxFailures: Number(failures[0]?.n ?? 0),
      recentAudit: audit.map(auditView),
    };
  }
}

/** Part states grouped by lot, in lot-number order. */
function perLot(states: PartState[]): { lot: Part['lot']; states: PartState[] }[] {
  const lots = new Map<string, { lot: Part['lot']; states: PartState[] }>();
  for (const s of states) {
    const entry = lots.get(s.part.lot.id) ?? { lot: s.part.lot, states: [] };
    entry.states.push(s);
    lots.set(s.part.lot.id, entry);
  }
  return [...lots.values()];
}
