import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

/** What a list says when there is nothing in it yet, and what to do about it. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <Paper sx={{ p: 3, bgcolor: 'background.default', borderStyle: 'dashed' }}>
      <Typography variant="h3" component="p" sx={{ mb: children ? 1 : 0 }}>
        {title}
      </Typography>
      {children && <Typography component="div">{children}</Typography>}
    </Paper>
  );
}
