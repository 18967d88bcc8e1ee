import type { DisplayUnit, GaugeStudyResult, GrrVerdict } from '@evenset/contracts';
import { displayResolution, fromMillimetres } from '@evenset/metrology';
import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import HighlightOffOutlined from '@mui/icons-material/HighlightOffOutlined';
import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import type { ReactElement } from 'react';
import { DetailList } from '../../../components/display/detail-list';
import { Figures } from '../../../components/display/figures';
import { formatSmallLength } from '../../../lib/small-length';

const SOURCE_LABELS: Record<GaugeStudyResult['anova'][number]['source'], string> = {
  part: 'Parts',
  operator: 'Inspectors',
  'part × operator': 'Parts × inspectors',
  repeatability: 'Repeatability (error)',
  total: 'Total',
};

/** The usual reading of %GR&R (common practice: under 10 %, 10–30 %, over 30 %), in words and an icon. */
export const VERDICTS: Record<
  GrrVerdict,
  { text: string; severity: 'success' | 'warning' | 'error'; icon: ReactElement }
> = {
  acceptable: { text: 'Acceptable (under 10 %)', severity: 'success', icon: <CheckCircleOutlined /> },
  'may-be-acceptable': {
    text: 'May be acceptable, depending on the application (10–30 %)',
    severity: 'warning',
    icon: <WarningAmberOutlined />,
  },
  'not-acceptable': { text: 'Not acceptable (over 30 %)', severity: 'error', icon: <HighlightOffOutlined /> },
};

const sig = (v: number) => (Math.abs(v) >= 1e-3 && Math.abs(v) < 1e4 ? v.toPrecision(4) : v.toExponential(3));
const pct = (v: number) => `${v.toFixed(1)} %`;

/** The ANOVA table and what follows from it, lengths in the reader's unit. */
export function StudyResult({ result, unit }: { result: GaugeStudyResult; unit: DisplayUnit }) {
  const { symbol } = displayResolution(unit, 'fine');
  const sq = (mm2: number) => fromMillimetres(fromMillimetres(mm2, unit), unit);
  const sigma = (mm: number) => <Figures>{formatSmallLength(mm, unit, true)}</Figures>;
  const tol = VERDICTS[result.verdictOfTolerance];
  const tot = VERDICTS[result.verdictOfTotal];
  return (
    <Stack spacing={2}>
      <Alert severity={tol.severity} icon={tol.icon}>
        <strong>%GR&R of the tolerance {pct(result.pctGrrOfTolerance)}:</strong> {tol.text}.{' '}
        <strong>Of the total variation {pct(result.pctGrrOfTotal)}:</strong> {tot.text}. {result.ndc} distinct
        categories
        {result.ndc < 5 ? ' — fewer than 5: the gauge cannot tell the parts apart well (common practice)' : ''}.
      </Alert>
      <Table size="small" aria-label="Analysis of variance">
        <TableHead>
          <TableRow>
            <TableCell>Source</TableCell>
            <TableCell align="right">df</TableCell>
            <TableCell align="right">SS ({symbol}²)</TableCell>
            <TableCell align="right">MS ({symbol}²)</TableCell>
            <TableCell align="right">F</TableCell>
            <TableCell align="right">p</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {result.anova.map((row) => (
            <TableRow key={row.source}>
              <TableCell>{SOURCE_LABELS[row.source]}</TableCell>
              <TableCell align="right">
                <Figures>{row.degreesOfFreedom}</Figures>
              </TableCell>
              <TableCell align="right">
                <Figures>{sig(sq(row.sumOfSquares))}</Figures>
              </TableCell>
              <TableCell align="right">
                <Figures>{sig(sq(row.meanSquare))}</Figures>
              </TableCell>
              <TableCell align="right">
                <Figures>{row.f === null ? '' : row.f.toFixed(2)}</Figures>
              </TableCell>
              <TableCell align="right">
                <Figures>{row.pValue === null ? '' : row.pValue < 0.0001 ? '< 0.0001' : row.pValue.toFixed(4)}</Figures>
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      <Typography variant="body2" color="text.secondary">
        Two-way crossed ANOVA with the parts × inspectors interaction kept; standard deviations below are estimated from
        the mean squares (negative variance estimates set to 0).
      </Typography>
      <DetailList
        items={[
          { label: 'Repeatability (EV), σ', value: sigma(result.repeatability) },
          { label: 'Reproducibility (AV), σ', value: sigma(result.reproducibility) },
          { label: 'Gauge R&R, σ', value: sigma(result.grr) },
          { label: 'Part variation (PV), σ', value: sigma(result.partVariation) },
          { label: 'Total variation (TV), σ', value: sigma(result.totalVariation) },
          { label: '%GR&R of total variation', value: <Figures>{pct(result.pctGrrOfTotal)}</Figures> },
          {
            label: `%GR&R of the tolerance (6σ over ${formatSmallLength(result.tolerance, unit, true)})`,
            value: <Figures>{pct(result.pctGrrOfTolerance)}</Figures>,
          },
          { label: 'Number of distinct categories', value: <Figures>{result.ndc}</Figures> },
        ]}
      />
    </Stack>
  );
}
