import FormControl from '@mui/material/FormControl';
import FormHelperText from '@mui/material/FormHelperText';
import InputLabel from '@mui/material/InputLabel';
import OutlinedInput from '@mui/material/OutlinedInput';
import { useId, type ChangeEventHandler, type FocusEventHandler, type Ref } from 'react';

/**
 * A labelled outlined text box that looks like MUI's TextField without its `select` mode, so
 * the pages that load first (sign in) do not carry Select, Menu, Popover and Modal with them.
 * Takes react-hook-form's `register()` props as they come.
 */
export function TextInput({
  label,
  name,
  type = 'text',
  autoComplete,
  error,
  helperText,
  onChange,
  onBlur,
  ref,
}: {
  label: string;
  name: string;
  type?: string;
  autoComplete?: string;
  error?: boolean;
  helperText?: string;
  onChange?: ChangeEventHandler<HTMLInputElement>;
  onBlur?: FocusEventHandler<HTMLInputElement>;
  ref?: Ref<HTMLInputElement>;
}) {
  const id = useId();
  const helpId = `${id}-help`;
  return (
    <FormControl variant="outlined" error={error} fullWidth>
      <InputLabel htmlFor={id}>{label}</InputLabel>
      <OutlinedInput
        id={id}
        name={name}
        type={type}
        label={label}
        autoComplete={autoComplete}
        inputRef={ref}
        onChange={onChange}
        onBlur={onBlur}
        slotProps={{ input: { 'aria-describedby': helperText ? helpId : undefined } }}
      />
      {helperText && <FormHelperText id={helpId}>{helperText}</FormHelperText>}
    </FormControl>
  );
}
