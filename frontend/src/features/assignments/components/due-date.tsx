import Typography from '@mui/material/Typography';

const day = 24 * 60 * 60 * 1000;

/** "due in 3 days (Fri 14 Mar)", "due today", "was due 2 days ago". */
export function dueWords(dueAt: string, now = new Date()): string {
  const due = new Date(dueAt);
  const date = due.toLocaleDateString(undefined, { weekday: 'short', day: 'numeric', month: 'short' });
  const days = Math.round((due.getTime() - now.getTime()) / day);
  if (due.getTime() < now.getTime()) {
    return days === 0 ? `was due today (${date})` : `was due ${Math.abs(days)} ${Math.abs(days) === 1 ? 'day' : 'days'} ago (${date})`;
  }
  if (days === 0) return `due today (${date})`;
  return `due in ${days} ${days === 1 ? 'day' : 'days'} (${date})`;
}

export function DueDate({ dueAt }: { dueAt: string }) {
  return (
    <Typography variant="body2" color="text.secondary" component="span">
      {dueWords(dueAt)}
    </Typography>
  );
}

/** A date as `datetime-local` wants it: local time, no zone ("2026-03-14T18:00"). */
export function toLocalInput(date: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}T${pad(date.getHours())}:${pad(date.getMinutes())}`;
}
