import type { Home } from '@evenset/contracts';
import type { ReactNode } from 'react';
import { paths } from '../../../config/paths';
import { HomeTile } from './home-tile';

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const day = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeZone: 'UTC' });
const at = (iso: string) => when.format(new Date(iso));
const onDay = (isoDate: string) => day.format(new Date(`${isoDate}T00:00:00Z`));
const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
const sum = (values: number[]) => values.reduce((a, b) => a + b, 0);

/** The tiles of each role, from the home answer; a role's section renders only when the answer holds it. */
export const ROLE_TILES: {
  [K in keyof Required<Home>]: (section: NonNullable<Home[K]>) => ReactNode;
} = {
  inspector: ({ lotsWaiting, recentRuns }) => (
    <>
      <HomeTile
        title="Lots waiting for inspection"
        count={sum(lotsWaiting.map((l) => l.notInspected))}
        countLabel="parts not inspected yet"
        empty="Every registered part has been inspected."
        lines={lotsWaiting.map((lot) => ({
          key: lot.lotId,
          label: lot.lotNumber,
          href: paths.lot.getHref(lot.lotId),
          detail: `${lot.partNumber} — ${lot.notInspected} of ${plural(lot.parts, 'part')} to inspect`,
        }))}
        action={{ label: 'Open the Bench', href: paths.bench.getHref() }}
      />
      <HomeTile
        title="Your recent runs"
        empty="You have not run an inspection yet."
        lines={recentRuns.map((run) => ({
          key: run.runId,
          label: run.lotNumber,
          href: paths.lot.getHref(run.lotId),
          detail: `${run.partNumber}, ${at(run.startedAt)} — ${plural(run.inspections, 'inspection')}${
            run.endedAt ? '' : ', still open'
          }`,
        }))}
        action={{ label: 'Open lots', href: paths.lots.getHref() }}
      />
    </>
  ),
  engineer: ({ awaitingDisposition, mastersDue, runRuleSignals, grindRequests }) => (
    <>
      <HomeTile
        title="Parts waiting for a decision"
        count={sum(awaitingDisposition.map((l) => l.doesNotConform + l.guardBand + l.held))}
        countLabel="not conforming, in a guard band or held"
        empty="No part is waiting for a disposition."
        lines={awaitingDisposition.map((lot) => ({
          key: lot.lotId,
          label: lot.lotNumber,
          href: paths.lot.getHref(lot.lotId),
          detail: [
            lot.doesNotConform ? `${lot.doesNotConform} does not conform` : '',
            lot.guardBand ? `${lot.guardBand} in the guard band` : '',
            lot.held ? `${lot.held} held` : '',
          ]
            .filter(Boolean)
            .join(', '),
        }))}
        action={{ label: 'Open lots', href: paths.lots.getHref() }}
      />
      <HomeTile
        title="Masters due or overdue"
        count={mastersDue.length}
        countLabel="due within 30 days or overdue"
        empty="No master needs calibrating within 30 days."
        lines={mastersDue.map((m) => ({
          key: m.id,
          label: m.code,
          href: paths.master.getHref(m.id),
          detail: `${m.overdue ? 'overdue since' : 'due'} ${onDay(m.dueOn)}`,
        }))}
        action={{ label: 'Open masters', href: paths.masters.getHref() }}
      />
      <HomeTile
        title="Run-rule signals"
        count={sum(runRuleSignals.map((p) => p.signals))}
        countLabel="points breaking a run rule on the height trends"
        empty="No released part number has a trend yet."
        lines={runRuleSignals.map((p) => ({
          key: p.partNumber,
          label: p.partNumber,
          href: paths.trends.getHref(p.partNumber),
          detail: p.signals ? plural(p.signals, 'signal') : 'no signal',
        }))}
        action={{ label: 'Open trends', href: paths.trends.getHref() }}
      />
      <HomeTile
        title="Open grind requests"
        count={grindRequests.open + grindRequests.ground}
        countLabel={`${grindRequests.open} to grind, ${grindRequests.ground} ground and waiting for re-inspection`}
        empty="No grind request is open."
        action={{ label: 'Open grind requests', href: paths.grindRequests.getHref() }}
      />
    </>
  ),
  sales: ({ stock, recentCertificates }) => (
    <>
      <HomeTile
        title="Sets free stock can make"
        count={sum(stock.map((s) => s.sets))}
        countLabel="whole sets"
        empty="No released part number has free stock."
        lines={stock.map((s) => ({
          key: s.partNumber,
          label: s.partNumber,
          href: paths.sets.getHref(s.partNumber),
          detail: `${plural(s.available, 'free part')} inside the window — ${plural(s.sets, `set of ${s.setSize}`, `sets of ${s.setSize}`)}`,
        }))}
        action={{ label: 'Build sets', href: paths.setNew.getHref() }}
      />
      <HomeTile
        title="Recent certificates"
        empty="No certificate has been issued yet."
        lines={recentCertificates.map((c) => ({
          key: c.id,
          label: c.certificateNumber,
          href: paths.set.getHref(c.setId),
          detail: `set ${c.setNumber} (${c.partNumber}), ${at(c.issuedAt)}`,
        }))}
        action={{ label: 'Open certificates', href: paths.certificates.getHref() }}
      />
    </>
  ),
  service: ({ openCases, recentReplacements }) => (
    <>
      <HomeTile
        title="Open replacement cases"
        count={openCases.length}
        countLabel="grind requests not re-inspected yet"
        empty="No replacement case is open."
        lines={openCases.map((c) => ({
          key: c.id,
          label: c.requestNumber,
          href: paths.grindRequest.getHref(c.id),
          detail: `${c.partNumber} ${c.serial} — ${c.status === 'open' ? 'to grind' : 'ground, to re-inspect'}`,
        }))}
        action={{ label: 'Open grind requests', href: paths.grindRequests.getHref() }}
      />
      <HomeTile
        title="Recent replacements"
        empty="No replacement has been sent yet."
        lines={recentReplacements.map((r) => ({
          key: r.id,
          label: r.setNumber,
          href: paths.set.getHref(r.id),
          detail: `${r.partNumber}, replaces ${r.replacesSetNumber}, ${at(r.createdAt)}`,
        }))}
        action={{ label: 'Check a replacement', href: paths.replacements.getHref() }}
      />
    </>
  ),
  admin: ({ people, outboxFailures, recentAudit }) => (
    <>
      <HomeTile
        title="People"
        count={people.active}
        countLabel={`can sign in; ${people.inactive} deactivated`}
        empty="No one can sign in."
        action={{ label: 'Open people', href: paths.people.getHref() }}
      />
      <HomeTile
        title="Outbox failures"
        count={outboxFailures}
        countLabel={outboxFailures === 1 ? 'message not sent' : 'messages not sent'}
        empty="Every message went out."
        action={{ label: 'Open the outbox', href: paths.outbox.getHref() }}
      />
      <HomeTile
        title="Latest changes"
        empty="Nothing has been changed yet."
        lines={recentAudit.map((a) => ({
          key: a.id,
          label: a.action,
          href: paths.auditLog.getHref(a.subjectId),
          detail: `by ${a.actorName}, ${at(a.createdAt)}`,
        }))}
        action={{ label: 'Open the audit log', href: paths.auditLog.getHref() }}
      />
    </>
  ),
};
