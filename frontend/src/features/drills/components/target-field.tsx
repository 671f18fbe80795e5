import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import Box from '@mui/material/Box';
import IconButton from '@mui/material/IconButton';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import type { CreateDrillInput, TargetInput } from '@mixmark/common';
import { useFormContext, useWatch, type FieldError } from 'react-hook-form';
import { colourFacts, temperatureWord } from '@/components/colour/colour-facts';
import { swatchSurface } from '@/theme/theme';
import { fieldHelp } from '@/lib/form-errors';
import { schemaSentence } from '@/lib/error-words';
import { convertTarget, entryMode, targetLab, type EntryMode } from './target-colour';

const numberInput = { setValueAs: (v: string) => (v === '' ? undefined : Number(v)) };

/** The live swatch on grey with its value, temperature and an out-of-gamut warning. */
function LiveSwatch({ target }: { target: TargetInput }) {
  const lab = targetLab(target);
  if (!lab) {
    return (
      <Box sx={{ bgcolor: swatchSurface, color: '#000', p: 2, borderRadius: 1.5, minWidth: 180 }}>
        <Typography variant="body2">Enter a colour to see it here.</Typography>
      </Box>
    );
  }
  const facts = colourFacts(lab);
  return (
    <Box sx={{ bgcolor: swatchSurface, color: '#000', p: 2, borderRadius: 1.5, minWidth: 180 }}>
      <Box role="img" aria-label={`Preview ${facts.hex}`} sx={{ height: 64, bgcolor: facts.hex, borderRadius: 1, mb: 1 }} />
      <Typography variant="body2" sx={{ fontVariantNumeric: 'tabular-nums' }}>
        {facts.hex} · L* {facts.L.toFixed(1)} · C* {facts.C.toFixed(1)} · h {facts.h.toFixed(0)}°
      </Typography>
      <Typography variant="body2">
        Value {facts.value.toFixed(1)} of 10 · {temperatureWord(facts.warmCool)} (WC {facts.warmCool.toFixed(2)})
      </Typography>
      {!facts.inGamut && (
        <Typography variant="body2" sx={{ display: 'flex', gap: 0.5, alignItems: 'center', mt: 0.5, fontWeight: 700 }}>
          <WarningAmberOutlined fontSize="small" aria-hidden /> Outside what a screen can show: the swatch is the
          nearest screen colour, and it may be out of reach of some palettes.
        </Typography>
      )}
    </Box>
  );
}

/** One target, entered as hex, Lab or LCh; switching converts what is there. */
export function TargetField({ index, onRemove }: { index: number; onRemove?: () => void }) {
  const { register, setValue, control, formState } = useFormContext<CreateDrillInput>();
  const target = useWatch({ control, name: `targets.${index}` }) ?? {};
  const mode = entryMode(target);
  const errors = formState.errors.targets?.[index] as
    | (FieldError & { hex?: FieldError; lab?: Record<string, FieldError>; lch?: Record<string, FieldError> })
    | undefined;
  const name = `targets.${index}` as const;

  const switchMode = (next: EntryMode | null) => {
    if (next && next !== mode) setValue(name, convertTarget(target, next), { shouldDirty: true });
  };

  const numberField = (part: 'lab' | 'lch', key: string, label: string) => (
    <TextField
      key={`${part}.${key}`}
      label={label}
      type="number"
      size="small"
      slotProps={{ htmlInput: { step: 0.1 } }}
      {...register(`${name}.${part}.${key}` as `targets.0.lab.L`, numberInput)}
      error={Boolean(errors?.[part]?.[key])}
      helperText={errors?.[part]?.[key] ? fieldHelp(key, errors[part]![key]) : undefined}
      sx={{ width: 110 }}
    />
  );

  return (
    <Paper sx={{ p: 2 }} component="fieldset" aria-label={`Target ${index + 1}`}>
      <Stack direction={{ xs: 'column', md: 'row' }} spacing={2}>
        <Stack spacing={1.5} sx={{ flexGrow: 1 }}>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
            <Typography sx={{ fontWeight: 800 }}>Target {index + 1}</Typography>
            <ToggleButtonGroup
              size="small"
              exclusive
              value={mode}
              onChange={(_event, next: EntryMode | null) => switchMode(next)}
              aria-label={`How target ${index + 1} is entered`}
            >
              <ToggleButton value="hex">Hex</ToggleButton>
              <ToggleButton value="lab">Lab</ToggleButton>
              <ToggleButton value="lch">LCh</ToggleButton>
            </ToggleButtonGroup>
            {onRemove && (
              <IconButton aria-label={`Remove target ${index + 1}`} onClick={onRemove}>
                <DeleteOutlined />
              </IconButton>
            )}
          </Stack>
          <Stack direction="row" spacing={1} useFlexGap sx={{ flexWrap: 'wrap' }}>
            {mode === 'hex' && (
              <TextField
                label="Hex"
                size="small"
                {...register(`${name}.hex`)}
                error={Boolean(errors?.hex)}
                helperText={fieldHelp('hex', errors?.hex)}
                sx={{ width: 150 }}
              />
            )}
            {mode === 'lab' && [numberField('lab', 'L', 'L*'), numberField('lab', 'a', 'a*'), numberField('lab', 'b', 'b*')]}
            {mode === 'lch' && [numberField('lch', 'L', 'L*'), numberField('lch', 'C', 'C*'), numberField('lch', 'h', 'h°')]}
          </Stack>
          <TextField label="Label (optional)" size="small" {...register(`${name}.label`)} sx={{ maxWidth: 300 }} />
          {errors?.message && !errors.hex && !errors.lab && !errors.lch && (
            <Typography color="error" variant="body2">
              {errors.type === 'one-colour'
                ? 'Give the colour once: as hex, as Lab or as LCh.'
                : (schemaSentence(errors.message) ?? 'Check this colour.')}
            </Typography>
          )}
        </Stack>
        <LiveSwatch target={target} />
      </Stack>
    </Paper>
  );
}
