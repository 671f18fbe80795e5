import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

/** The narrow card the account pages sit in: heading, a line of why, the form, links below. */
export function AuthCard({
  title,
  intro,
  children,
  footer,
}: {
  title: string;
  intro?: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}) {
  return (
    <Paper sx={{ maxWidth: 460, mx: 'auto', p: { xs: 2.5, sm: 4 } }}>
      <Stack spacing={2.5}>
        <Stack spacing={1}>
          <Typography variant="h2" component="h1">
            {title}
          </Typography>
          {intro && <Typography color="text.secondary">{intro}</Typography>}
        </Stack>
        {children}
        {footer && <Typography component="div">{footer}</Typography>}
      </Stack>
    </Paper>
  );
}
