import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { parsePigmentCodes } from './parse-pigment-codes';

/** Colour Index codes typed as "PB29, PR209": the text as typed, the list to the form. */
export function PigmentsField({
  value,
  onChange,
  label,
  error,
  helperText,
}: {
  value: string[];
  onChange: (codes: string[]) => void;
  label: string;
  error?: boolean;
  helperText?: string;
}) {
  const [text, setText] = useState(value.join(', '));
  return (
    <TextField
      label={label}
      size="small"
      value={text}
      onChange={(event) => {
        setText(event.target.value);
        onChange(parsePigmentCodes(event.target.value));
      }}
      error={error}
      helperText={helperText ?? 'Colour Index codes, such as PB29, PR 209'}
    />
  );
}
