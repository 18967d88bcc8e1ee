import ArrowForwardOutlined from '@mui/icons-material/ArrowForwardOutlined';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardActions from '@mui/material/CardActions';
import CardContent from '@mui/material/CardContent';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, type ReactNode } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { slate } from '../../../theme/tokens';

export interface TileLine {
  key: string;
  /** The line's link text (a lot number, a set number, a request). */
  label: string;
  href: string;
  detail: ReactNode;
}

interface HomeTileProps {
  title: string;
  /** The headline number; left out when the tile is a list only. */
  count?: number | undefined;
  countLabel?: string | undefined;
  /** Said when there is nothing to do. */
  empty: string;
  lines?: readonly TileLine[] | undefined;
  children?: ReactNode;
  action: { label: string; href: string };
}

/** One piece of waiting work: how much, the first few items, and a way to the page that does it. */
export function HomeTile({ title, count, countLabel, empty, lines = [], children, action }: HomeTileProps) {
  const id = useId();
  const nothing = count === 0 || (count === undefined && !lines.length && !children);
  return (
    <Card component="section" aria-labelledby={id} variant="outlined" sx={{ display: 'flex', flexDirection: 'column' }}>
      <CardContent sx={{ flexGrow: 1 }}>
        <Typography variant="h3" id={id} sx={{ mb: 1 }}>
          {title}
        </Typography>
        {count !== undefined ? (
          <Stack direction="row" spacing={1} sx={{ alignItems: 'baseline', mb: 1 }}>
            <Typography
              component="span"
              data-tile-count
              sx={{ fontSize: '2rem', fontWeight: 700, lineHeight: 1.1, color: slate[800] }}
            >
              {count}
            </Typography>
            {countLabel ? (
              <Typography component="span" sx={{ color: 'text.secondary' }}>
                {countLabel}
              </Typography>
            ) : null}
          </Stack>
        ) : null}
        {nothing ? <Typography sx={{ color: 'text.secondary' }}>{empty}</Typography> : null}
        {children}
        {lines.length ? (
          <Stack component="ul" spacing={0.75} sx={{ m: 0, p: 0, listStyle: 'none' }}>
            {lines.map((line) => (
              <li key={line.key}>
                <Link component={RouterLink} to={line.href} sx={{ fontWeight: 500 }}>
                  {line.label}
                </Link>
                <Typography component="span" variant="body2" sx={{ color: 'text.secondary' }}>
                  {' '}
                  {line.detail}
                </Typography>
              </li>
            ))}
          </Stack>
        ) : null}
      </CardContent>
      <CardActions sx={{ px: 2, pb: 2 }}>
        <Button component={RouterLink} to={action.href} variant="outlined" endIcon={<ArrowForwardOutlined />}>
          {action.label}
        </Button>
      </CardActions>
    </Card>
  );
}
