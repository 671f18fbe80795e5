import Alert from '@mui/material/Alert';
import Typography from '@mui/material/Typography';
import { useAssignment } from '../api/get-assignment';
import { dueWords } from './due-date';

/**
 * What the teacher said when setting this drill, and when it is due: shown where the student
 * takes the photo, so the note is read before the swatch goes in. Nothing while it loads or
 * when it cannot be fetched (the drill page itself still works).
 */
export function AssignmentBrief({ assignmentId }: { assignmentId: string }) {
  const assignment = useAssignment({ id: assignmentId });
  if (!assignment.data) return null;
  const { note, className, dueAt } = assignment.data;
  return (
    // role "note": MUI's Alert is role="alert" (announced at once, as for an error); the brief is
    // standing information, and the page's real alerts (an upload refused) must stay the only ones.
    <Alert severity="info" icon={false} role="note" sx={{ mb: 2 }} aria-label="From your teacher">
      <Typography variant="body2" sx={{ fontWeight: 700 }}>
        {className}: {dueWords(dueAt)}
      </Typography>
      {note && (
        <Typography variant="body2" sx={{ whiteSpace: 'pre-line', mt: 0.5 }}>
          Your teacher’s note: “{note}”
        </Typography>
      )}
    </Alert>
  );
}
