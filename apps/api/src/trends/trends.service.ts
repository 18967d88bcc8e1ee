import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import { z } from 'zod';
import { trendQuerySchema, type Trend, type TrendCapability, type TrendPartNumber } from '@evenset/contracts';
import { capability } from '@evenset/metrology';
import { NotFoundException } from '../common/errors/domain.exception';
import { Spec } from '../specs/spec.entity';
import { choicesOf, pointsOf } from './trend-points';
import { trendData, type TrendRow } from './trend-rows';
import { histogram, individualsChart, signalsOf, subgroupChart, type Group } from './trend-charts';

type TrendFilters = z.output<typeof trendQuerySchema>;

/** Fewer values than this behind Cp/Cpk draw a warning (common practice: about 30). */
export const FEW_VALUES = 30;

/**
 * Trends of part height per part number, read from the records: each part's current height (the
 * newest result of its newest inspection no correction superseded), whatever its later status.
 */
@Injectable()
export class TrendsService {
  constructor(private readonly em: EntityManager) {}

  /** Part numbers with a released revision, the ones a trend can be drawn against. */
  async partNumbers(): Promise<{ items: TrendPartNumber[] }> {
    const specs = await this.em.find(Spec, { status: 'released' }, { orderBy: { partNumber: 'asc', revision: 'asc' } });
    return {
      items: specs.map((s) => ({ partNumber: s.partNumber, revision: s.revision, title: s.title })),
    };
  }

  async trend(partNumber: string, filters: TrendFilters): Promise<Trend> {
    const specs = await this.em.find(Spec, { partNumber }, { orderBy: { releasedAt: 'desc', createdAt: 'desc' } });
    if (!specs.length) throw new NotFoundException(`Part number ${partNumber}`);
    const released = specs.find((s) => s.status === 'released') ?? null;

    const data = await trendData(this.em, partNumber);
    const { choices, placeOf } = choicesOf(data);
    const rows = filtered(data.rows, filters);
    const points = pointsOf(rows, placeOf);
    const heights = points.height;
    const serials = points.serial;

    const lotNumbers = new Map(data.lots.map((l) => [l.id, l.lotNumber]));
    const subgroups = subgroupChart(filters.subgroup, groupsOf(rows, filters.subgroup, lotNumbers));
    const chart = individualsChart(heights);
    const signals = [
      ...(subgroups.xbar
        ? signalsOf(
            'xbar',
            subgroups.subgroups.map((g) => g.mean),
            subgroups.xbar,
            subgroups.subgroups.map((g) => g.label),
          )
        : []),
      ...(chart ? signalsOf('individuals', heights, chart.individuals, serials) : []),
    ];

    const band = released
      ? {
          id: released.id,
          revision: released.revision,
          nominal: released.nominalMm,
          lower: released.nominalMm + released.bandLowerMm,
          upper: released.nominalMm + released.bandUpperMm,
        }
      : null;
    const { capability: cap, note } = capabilityOf(heights, band);

    return {
      partNumber,
      spec: band,
      points,
      subgroups,
      individuals: chart,
      signals,
      capability: cap,
      capabilityNote: note,
      histogram: histogram(heights),
      choices,
    };
  }
}

/** The rows the filters keep (all of them, as they are, when no filter is set). */
function filtered(rows: TrendRow[], f: TrendFilters): TrendRow[] {
  const inspector = f.inspector?.toLowerCase();
  if (!f.from && !f.to && !f.lotIds?.length && !f.masterId && !inspector) return rows;
  return rows.filter((row) => {
    const day = row.inspectedAt.slice(0, 10);
    if (f.from && day < f.from) return false;
    if (f.to && day > f.to) return false;
    if (f.lotIds?.length && !f.lotIds.includes(row.lotId)) return false;
    if (f.masterId && row.masterId !== f.masterId) return false;
    return !inspector || row.inspectorId === f.inspector || row.inspectorName.toLowerCase() === inspector;
  });
}

/** Subgroups by lot (in chart order) or by sold set (in order of sale); parts in no set are not grouped. */
function groupsOf(rows: readonly TrendRow[], basis: 'lot' | 'set', lotNumbers: Map<string, string>): Group[] {
  const groups = new Map<string, Group & { order: number }>();
  for (const row of rows) {
    const label = basis === 'lot' ? lotNumbers.get(row.lotId)! : row.setNumber;
    if (label === null) continue;
    const order = basis === 'lot' ? groups.size : (row.setCreatedAt ?? 0);
    const group = groups.get(label) ?? { label, serials: [], heights: [], order };
    group.serials.push(row.serial);
    group.heights.push(row.height);
    groups.set(label, group);
  }
  return [...groups.values()]
    .sort((a, b) => a.order - b.order || a.label.localeCompare(b.label))
    .map(({ label, serials, heights }) => ({ label, serials, heights }));
}

/**
 * Cp and Cpk against the released band, σ the sample standard deviation of the heights
 * (NIST/SEMATECH e-Handbook §6.1.6, through `capability` of @evenset/metrology).
 */
function capabilityOf(
  heights: readonly number[],
  band: { revision: string; lower: number; upper: number } | null,
): { capability: TrendCapability | null; note: string | null } {
  if (!band) return { capability: null, note: 'This part number has no released revision, so there is no band.' };
  if (heights.length < 2) return { capability: null, note: 'Capability needs at least 2 heights.' };
  const low = Math.min(...heights);
  if (Math.max(...heights) - low < 1e-12)
    return { capability: null, note: 'Every height is the same, so their spread gives no capability figure.' };
  const c = capability(heights, band.lower, band.upper);
  const fewValues = c.count < FEW_VALUES;
  return {
    capability: {
      revision: band.revision,
      lower: band.lower,
      upper: band.upper,
      count: c.count,
      mean: c.mean,
      sigma: c.sigma,
      cp: c.cp,
      cpk: c.cpk,
      fewValues,
      warning: fewValues
        ? `Only ${c.count} values: common practice wants about ${FEW_VALUES} or more before trusting Cp and Cpk; read them as a first estimate.`
        : null,
    },
    note: null,
  };
}
