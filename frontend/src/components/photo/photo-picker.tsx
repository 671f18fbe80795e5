import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import Box from '@mui/material/Box';
import Button, { type ButtonProps } from '@mui/material/Button';
import { useId } from 'react';

/**
 * A button that opens the phone's camera (`capture`) or the file chooser, for one photo. The
 * file input stays in the page (visually hidden) so the button is its label for every reader;
 * `sx` styles the block around both.
 */
export function PhotoPicker({
  label,
  onPick,
  clearAfterPick = false,
  disabled,
  variant = 'contained',
  size,
  fullWidth,
  sx,
}: {
  label: string;
  onPick: (photo: File | undefined) => void;
  /** Empty the input after each pick, so the same file can be sent again. */
  clearAfterPick?: boolean;
} & Pick<ButtonProps, 'disabled' | 'variant' | 'size' | 'fullWidth' | 'sx'>) {
  const inputId = useId();
  return (
    <Box sx={sx}>
      <input
        id={inputId}
        type="file"
        accept="image/*"
        capture="environment"
        disabled={disabled}
        style={{ position: 'absolute', width: 1, height: 1, opacity: 0 }}
        onChange={(event) => {
          const photo = event.target.files?.[0];
          if (clearAfterPick) event.target.value = '';
          onPick(photo);
        }}
      />
      <Button
        component="label"
        htmlFor={inputId}
        variant={variant}
        size={size}
        fullWidth={fullWidth}
        startIcon={<PhotoCameraOutlined />}
        disabled={disabled}
      >
        {label}
      </Button>
    </Box>
  );
}
