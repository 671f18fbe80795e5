import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import HighlightOffOutlined from '@mui/icons-material/HighlightOffOutlined';
import Chip from '@mui/material/Chip';

/** Pass or not yet, by icon and word as well as colour. */
export function PassBadge({ pass, score }: { pass: boolean; score?: number | null }) {
  const label = `${pass ? 'Pass' : 'Not yet'}${score !== undefined && score !== null ? ` · ${score}/100` : ''}`;
  return (
    <Chip
      icon={pass ? <CheckCircleOutlined /> : <HighlightOffOutlined />}
      label={label}
      color={pass ? 'success' : 'error'}
      variant="outlined"
      sx={{ fontWeight: 700, bgcolor: 'background.paper' }}
    />
  );
}
