import type { DisplayUnit, Inspection } from '@evenset/contracts';
import FlagOutlined from '@mui/icons-material/FlagOutlined';
import HistoryOutlined from '@mui/icons-material/HistoryOutlined';
import Accordion from '@mui/material/Accordion';
import AccordionDetails from '@mui/material/AccordionDetails';
import AccordionSummary from '@mui/material/AccordionSummary';
import ExpandMoreOutlined from '@mui/icons-material/ExpandMoreOutlined';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { StatusLabel } from '../../../components/display/status-label';
import { VerdictLabel } from '../../../components/display/verdict-label';
import { ReadingsTable } from './readings-table';
import { ResultSummary } from './result-summary';

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** Every inspection of a part, newest first; superseded ones stay, marked, with the reason. */
export function InspectionHistory({ inspections, unit }: { inspections: readonly Inspection[]; unit: DisplayUnit }) {
  if (inspections.length === 0) return <Typography sx={{ color: 'text.secondary' }}>Not inspected yet.</Typography>;
  return (
    <div>
      {inspections.map((inspection, index) => (
        <Accordion key={inspection.id} defaultExpanded={index === 0} disableGutters variant="outlined">
          <AccordionSummary expandIcon={<ExpandMoreOutlined />}>
            <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
              <Typography sx={{ fontWeight: 500 }}>{when.format(new Date(inspection.createdAt))}</Typography>
              <Typography sx={{ color: 'text.secondary' }}>by {inspection.inspector}</Typography>
              <VerdictLabel verdict={inspection.result.verdict} side={inspection.result.decisions.height.side} />
              {inspection.supersededById ? (
                <StatusLabel icon={HistoryOutlined} label="Superseded" tone="neutral" />
              ) : null}
              {inspection.runFlagged ? <StatusLabel icon={FlagOutlined} label="Run drift flag" tone="warning" /> : null}
            </Stack>
          </AccordionSummary>
          <AccordionDetails>
            <Stack spacing={2}>
              {inspection.reason ? (
                <Typography>Correction of an earlier inspection: {inspection.reason}</Typography>
              ) : null}
              <ResultSummary result={inspection.result} unit={unit} />
              <ReadingsTable inspection={inspection} unit={unit} />
            </Stack>
          </AccordionDetails>
        </Accordion>
      ))}
    </div>
  );
}
