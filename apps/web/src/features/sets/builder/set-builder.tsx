import type { Customer, DisplayUnit, Proposal, ProposalRequest, Stock } from '@evenset/contracts';
import ReplayOutlined from '@mui/icons-material/ReplayOutlined';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useEffect, useMemo, useRef, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { SectionCard } from '../../../components/display/section-card';
import { useNotify } from '../../../components/feedback/notifications';
import { paths } from '../../../config/paths';
import { ApiError } from '../../../lib/api-client';
import { describeError } from '../../../lib/errors';
import { allocateSets, proposeSets, useRevalidateSets } from '../api/sets';
import { AllocateStep, type OrderForm } from './allocate-step';
import { checkDraft, draftOf, removeSet, swapPart, type Draft } from './draft';
import { ProposalStep } from './proposal-step';
import { StockStep } from './stock-step';

/** Why the draft cannot be allocated as it stands, in one sentence; null when it can. */
function blockedReason(draft: Draft, okSets: readonly boolean[]): string | null {
  if (draft.sets.length === 0) return 'There is no set to allocate.';
  const bad = okSets.flatMap((ok, index) => (ok ? [] : [index + 1]));
  if (bad.length === 0) return null;
  return `${bad.length === 1 ? `Set ${bad[0]} needs` : `Sets ${bad.join(', ')} need`} a change first: swap a part or remove the set.`;
}

const joinNames = (names: readonly string[]) =>
  names.length <= 1 ? (names[0] ?? '') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;

/**
 * The set builder: choose a part number and how many sets, adjust the system's proposal by hand
 * (the spread updates with every swap), then allocate it to a customer's order in one step.
 */
interface SetBuilderProps {
  stock: readonly Stock[];
  unit: DisplayUnit;
  /** A customer to start with, e.g. when the builder was opened from their page. */
  customerId?: string | null;
}

export function SetBuilder({ stock, unit, customerId = null }: SetBuilderProps) {
  const notify = useNotify();
  const navigate = useNavigate();
  const revalidate = useRevalidateSets();
  const [request, setRequest] = useState<ProposalRequest | null>(null);
  const [proposal, setProposal] = useState<Proposal | null>(null);
  const [draft, setDraft] = useState<Draft | null>(null);
  const [proposing, setProposing] = useState(false);
  const [proposeError, setProposeError] = useState<string | null>(null);
  const [refusal, setRefusal] = useState<string | null>(null);
  const proposalHeading = useRef<HTMLDivElement>(null);
  // Moves the focus to the new proposal once it is on screen, for keyboards and screen readers.
  const [focusProposal, setFocusProposal] = useState(0);

  useEffect(() => {
    if (focusProposal === 0) return;
    // Focusing also scrolls the proposal into view.
    proposalHeading.current?.focus();
  }, [focusProposal]);

  const propose = async (next: ProposalRequest) => {
    setProposing(true);
    setProposeError(null);
    try {
      const answer = await proposeSets(next);
      setRequest(next);
      setProposal(answer);
      setDraft(draftOf(answer));
      setRefusal(null);
      setFocusProposal((n) => n + 1);
    } catch (error) {
      setProposeError(describeError(error));
    } finally {
      setProposing(false);
    }
  };

  const checks = useMemo(
    () => (proposal && draft ? checkDraft(draft, proposal.matchingBand, proposal.window) : []),
    [proposal, draft],
  );

  const allocate = async (order: OrderForm, customer: Customer) => {
    if (!proposal || !draft) return;
    setRefusal(null);
    try {
      const { items } = await allocateSets({
        partNumber: proposal.partNumber,
        customerId: order.customerId,
        orderReference: order.orderReference,
        sets: draft.sets.map((set) => ({ partIds: set.parts.map((p) => p.id) })),
      });
      void revalidate();
      notify(
        `${items.length === 1 ? 'Set' : 'Sets'} ${joinNames(items.map((s) => s.setNumber))} allocated to ${customer.name}, order ${order.orderReference.trim()}.`,
      );
      void navigate(paths.customer.getHref(customer.id));
    } catch (error) {
      // A part taken meanwhile, or a set that no longer fits: the proposal is stale; say so plainly.
      if (error instanceof ApiError && error.status === 409) {
        setRefusal(error.message);
        void revalidate();
        return;
      }
      if (error instanceof ApiError && error.status === 400) {
        const fields: Partial<Record<keyof OrderForm, string>> = {};
        for (const detail of error.details) {
          const field = detail.path.split('.')[0];
          if (field === 'customerId' || field === 'orderReference') fields[field] = detail.message;
        }
        if (Object.keys(fields).length === error.details.length && error.details.length > 0) return fields;
      }
      setRefusal(describeError(error));
    }
  };

  const blocked = draft
    ? blockedReason(
        draft,
        checks.map((c) => c.ok),
      )
    : null;
  const proposeAgain = request ? () => void propose(request) : undefined;

  return (
    <Stack spacing={3}>
      <SectionCard
        title="1. Part number and quantity"
        description="Sets are built from released parts that are in no set yet and match the sets sold before."
      >
        <StockStep stock={stock} unit={unit} proposing={proposing} onPropose={(next) => void propose(next)} />
        {proposeError ? (
          <Alert severity="error" sx={{ mt: 2 }}>
            {proposeError}
          </Alert>
        ) : null}
      </SectionCard>
      {proposal && draft ? (
        <>
          <div ref={proposalHeading} tabIndex={-1} style={{ outline: 'none' }}>
            <SectionCard
              title={`2. Proposed sets of ${proposal.partNumber}`}
              description="Each set's spread is drawn against the matching band. Swap parts by hand and the spread follows; a set that no longer fits is marked and holds back the allocation."
              actions={
                <Button startIcon={<ReplayOutlined />} onClick={proposeAgain} loading={proposing}>
                  Propose again
                </Button>
              }
            >
              <ProposalStep
                proposal={proposal}
                draft={draft}
                checks={checks}
                unit={unit}
                onSwap={(setKey, partId, spareId) => setDraft(swapPart(draft, setKey, partId, spareId))}
                onRemove={(setKey) => setDraft(removeSet(draft, setKey))}
              />
            </SectionCard>
          </div>
          {proposal.sets.length > 0 ? (
            <SectionCard
              title="3. Customer and order"
              description="The sets are allocated to this order; an order reference the customer does not have yet is created with them."
            >
              <AllocateStep
                setCount={draft.sets.length}
                initialCustomerId={customerId}
                blocked={blocked}
                onAllocate={allocate}
                refusal={
                  refusal ? (
                    <Alert
                      severity="error"
                      action={
                        proposeAgain ? (
                          <Button color="inherit" onClick={proposeAgain} loading={proposing}>
                            Propose again
                          </Button>
                        ) : null
                      }
                    >
                      <AlertTitle>Nothing was allocated</AlertTitle>
                      {refusal}
                    </Alert>
                  ) : null
                }
              />
            </SectionCard>
          ) : null}
        </>
      ) : null}
    </Stack>
  );
}
