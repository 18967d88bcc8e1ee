import type { DisplayUnit, SetDetail } from '@evenset/contracts';
import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router-dom';
import { DetailList } from '../../../components/display/detail-list';
import { Figures } from '../../../components/display/figures';
import { paths } from '../../../config/paths';
import { formatDateTime, formatHeight, SET_KIND_LABELS } from '../set-format';

/** Whom the set went to, under which order, by whom, and its band. */
export function SetSummary({ set, unit }: { set: SetDetail; unit: DisplayUnit }) {
  const heights = set.members.map((m) => m.height);
  return (
    <DetailList
      items={[
        {
          label: 'Customer',
          value: (
            <Link component={RouterLink} to={paths.customer.getHref(set.customerId)}>
              {set.customerName}
            </Link>
          ),
        },
        { label: 'Order', value: set.orderReference },
        { label: 'Part number', value: set.partNumber },
        { label: 'Kind', value: SET_KIND_LABELS[set.kind] },
        { label: 'Allocated by', value: set.allocatedByName },
        { label: 'Allocated', value: formatDateTime(set.createdAt) },
        { label: 'Matching band', value: <Figures>{formatHeight(set.matchingBand, unit)}</Figures> },
        {
          label: 'Heights',
          value:
            heights.length > 0 ? (
              <Figures>
                {formatHeight(Math.min(...heights), unit)} to {formatHeight(Math.max(...heights), unit)}
              </Figures>
            ) : (
              '—'
            ),
        },
      ]}
    />
  );
}
