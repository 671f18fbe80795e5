import Alert from '@mui/material/Alert';
import type { SxProps, Theme } from '@mui/material/styles';
import { errorMessage } from '@/lib/error-words';
import { PhotoPicker } from './photo-picker';
import { UploadProgress } from './upload-progress';

/** What the two pieces below need of an upload mutation (`useUploadMutation`). */
export type MeasureUpload = {
  isPending: boolean;
  isError: boolean;
  error: unknown;
  progress: number;
  mutate: (photo: File) => void;
};

/** The picker that sends a swatch photo to be measured (camera on a phone, a file elsewhere). */
export function MeasurePhotoPicker({
  measure,
  measured,
  sx,
}: {
  measure: MeasureUpload;
  /** A reading is showing: the button offers another photo. */
  measured: boolean;
  sx?: SxProps<Theme>;
}) {
  return (
    <PhotoPicker
      label={measured || measure.isError ? 'Measure another photo' : 'Take or choose the photo'}
      clearAfterPick
      disabled={measure.isPending}
      onPick={(photo) => {
        if (photo) measure.mutate(photo);
      }}
      sx={sx}
    />
  );
}

/** The upload's progress while it goes, then its failure in the API's words. */
export function MeasurePhotoStatus({ measure }: { measure: MeasureUpload }) {
  return (
    <>
      {measure.isPending && (
        <UploadProgress progress={measure.progress} afterSent="Measuring the swatch…" />
      )}
      {measure.isError && (
        <Alert severity="error" role="alert">
          <strong>The swatch could not be measured.</strong> {errorMessage(measure.error)}
        </Alert>
      )}
    </>
  );
}
