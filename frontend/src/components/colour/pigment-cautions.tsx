import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Typography from '@mui/material/Typography';
import type { PigmentSafetyNote } from '@mixmark/common';

/** "PR108 (cadmium)": a pigment's code and the hazardous elements it carries. */
export const safetyNoteWords = (note: PigmentSafetyNote) => `${note.code} (${note.elements.join(', ')})`;

/**
 * The usual studio cautions for the hazardous pigments named, or nothing when there are none.
 * The notes and cautions come from `@mixmark/common` (directly, or as the API sends them).
 */
export function PigmentCautions({ notes, cautions }: { notes: readonly PigmentSafetyNote[]; cautions: readonly string[] }) {
  if (notes.length === 0 || cautions.length === 0) return null;
  return (
    <Alert severity="warning" role="note" icon={<WarningAmberOutlined />}>
      <AlertTitle>Handle with care</AlertTitle>
      <Typography variant="body2" sx={{ mb: 1 }}>
        {notes.map(safetyNoteWords).join(', ')}: common studio practice for these pigments:
      </Typography>
      <ul style={{ margin: 0, paddingLeft: '1.2em' }}>
        {cautions.map((line) => (
          <li key={line}>
            <Typography variant="body2">{line}</Typography>
          </li>
        ))}
      </ul>
      <Typography variant="body2" sx={{ mt: 1 }}>
        The paint's own label, its safety data sheet and your local rules come first.
      </Typography>
    </Alert>
  );
}
