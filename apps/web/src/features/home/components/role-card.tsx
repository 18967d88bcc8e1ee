import { ROLE_LABELS, type Role } from '@evenset/contracts';
import ArrowForwardOutlined from '@mui/icons-material/ArrowForwardOutlined';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardActions from '@mui/material/CardActions';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import type { NavItem } from '../../../config/navigation';
import { slate } from '../../../theme/tokens';
import { ROLE_WORK } from '../role-work';

/** One of the person's roles: what it is for, and the pages it opens. */
export function RoleCard({ role, pages }: { role: Role; pages: readonly NavItem[] }) {
  const { icon: Icon, work } = ROLE_WORK[role];
  return (
    <Card component="section" aria-labelledby={`role-${role}`} sx={{ display: 'flex', flexDirection: 'column' }}>
      <CardContent sx={{ flexGrow: 1 }}>
        <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center', mb: 1.5 }}>
          <Box
            sx={{
              display: 'grid',
              placeItems: 'center',
              width: 40,
              height: 40,
              borderRadius: 1,
              bgcolor: slate[100],
              color: slate[800],
            }}
          >
            <Icon />
          </Box>
          <Typography variant="h2" id={`role-${role}`}>
            {ROLE_LABELS[role]}
          </Typography>
        </Stack>
        <Typography>{work}</Typography>
      </CardContent>
      {pages.length > 0 ? (
        <CardActions disableSpacing sx={{ px: 2, pb: 2, flexWrap: 'wrap', gap: 1 }}>
          {pages.map((page) => (
            <Button
              key={page.path}
              component={RouterLink}
              to={page.path}
              variant="outlined"
              endIcon={<ArrowForwardOutlined />}
            >
              Open {page.label}
            </Button>
          ))}
        </CardActions>
      ) : null}
    </Card>
  );
}
