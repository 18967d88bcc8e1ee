import BlockOutlined from '@mui/icons-material/BlockOutlined';
import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import Stack from '@mui/material/Stack';

/** Word and icon together, so the state never rests on colour alone. */
export function AccountStatus({ active }: { active: boolean }) {
  const Icon = active ? CheckCircleOutlined : BlockOutlined;
  return (
    <Stack
      direction="row"
      spacing={0.75}
      sx={{ alignItems: 'center', height: '100%', color: active ? 'success.main' : 'text.secondary' }}
    >
      <Icon fontSize="small" aria-hidden="true" />
      <span>{active ? 'Active' : 'Deactivated'}</span>
    </Stack>
  );
}
