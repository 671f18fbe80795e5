import { yupResolver } from '@hookform/resolvers/yup';
import { paintOpacityValues, paintSchema, paintStainingValues, type Lab, type PaintInput } from '@mixmark/common';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { ColourSwatch } from '@/components/colour/colour-swatch';
import { PigmentsField } from '@/components/colour/pigments-field';
import { SwatchStage } from '@/components/ui/swatch-stage';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { useCreatePaint } from '../api/create-paint';
import { useUpdatePaint } from '../api/update-paint';
import { opacityWords, stainingWords, type Paint } from '../types';
import { MeasurePaintSwatch } from './measure-paint-swatch';

const fields = ['name', 'pigments', 'opacity', 'staining', 'granulating', 'swatchLab'] as const;

/** A Lab the fields hold in full (a field being typed in can be empty for a moment). */
const isWholeLab = (lab: PaintInput['swatchLab']): lab is Lab =>
  Boolean(lab) && [lab?.L, lab?.a, lab?.b].every((v) => typeof v === 'number' && Number.isFinite(v));

const toInput = (paint?: Paint): PaintInput => ({
  name: paint?.name ?? '',
  pigments: paint?.pigments ?? [],
  opacity: paint?.opacity ?? null,
  staining: paint?.staining ?? null,
  granulating: paint?.granulating ?? false,
  swatchLab: paint?.swatchLab ?? null,
});

/** Adds a paint to the palette, or edits one, through the shared `paintSchema`. */
export function PaintForm({ paint, onDone }: { paint?: Paint; onDone?: () => void }) {
  const [formError, setFormError] = useState<string>();
  const form = useForm<PaintInput>({ resolver: yupResolver(paintSchema), defaultValues: toInput(paint) });
  const done = () => {
    if (!paint) form.reset(toInput());
    onDone?.();
  };
  const create = useCreatePaint({ onSuccess: done });
  const update = useUpdatePaint({ id: paint?.id ?? '', onSuccess: done });
  const saving = create.isPending || update.isPending;
  const { errors } = form.formState;
  const swatch = useWatch({ control: form.control, name: 'swatchLab' });
  const idPrefix = paint ? `paint-${paint.id}` : 'new-paint';

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    const options = { onError: (error: unknown) => setFormError(applyServerErrors(error, form.setError, fields)) };
    if (paint) update.mutate(values, options);
    else create.mutate(values, options);
  });

  const labField = (key: 'L' | 'a' | 'b', label: string) => (
    <TextField
      label={label}
      type="number"
      size="small"
      slotProps={{ htmlInput: { step: 0.1 } }}
      {...form.register(`swatchLab.${key}`, { valueAsNumber: true })}
      error={Boolean(errors.swatchLab?.[key])}
      helperText={fieldHelp(key, errors.swatchLab?.[key])}
      sx={{ width: 110 }}
    />
  );

  return (
    <Stack component="form" noValidate onSubmit={onSubmit} spacing={2} aria-label={paint ? `Edit ${paint.name}` : 'Add a paint'}>
      {formError && <Alert severity="error">{formError}</Alert>}
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <TextField
          id={`${idPrefix}-name`}
          label="Name"
          size="small"
          {...form.register('name')}
          error={Boolean(errors.name)}
          helperText={fieldHelp('name', errors.name) ?? 'Your own name for it, as on your tube or pan'}
          sx={{ flex: 1 }}
        />
        <Controller
          control={form.control}
          name="pigments"
          render={({ field, fieldState }) => (
            <PigmentsField
              label="Pigments"
              value={field.value ?? []}
              onChange={field.onChange}
              error={Boolean(fieldState.error)}
              helperText={fieldState.error ? 'Colour Index codes such as PB29 or PR209, up to six' : undefined}
            />
          )}
        />
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
        <Controller
          control={form.control}
          name="opacity"
          render={({ field }) => (
            <TextField
              select
              label="Opacity"
              size="small"
              value={field.value ?? ''}
              onChange={(e) => field.onChange(e.target.value || null)}
              sx={{ minWidth: 190 }}
            >
              <MenuItem value="">Not stated</MenuItem>
              {paintOpacityValues.map((v) => (
                <MenuItem key={v} value={v}>
                  {opacityWords[v]}
                </MenuItem>
              ))}
            </TextField>
          )}
        />
        <Controller
          control={form.control}
          name="staining"
          render={({ field }) => (
            <TextField
              select
              label="Staining"
              size="small"
              value={field.value ?? ''}
              onChange={(e) => field.onChange(e.target.value || null)}
              sx={{ minWidth: 190 }}
            >
              <MenuItem value="">Not stated</MenuItem>
              {paintStainingValues.map((v) => (
                <MenuItem key={v} value={v}>
                  {stainingWords[v]}
                </MenuItem>
              ))}
            </TextField>
          )}
        />
        <Controller
          control={form.control}
          name="granulating"
          render={({ field }) => (
            <FormControlLabel control={<Checkbox checked={Boolean(field.value)} onChange={(e) => field.onChange(e.target.checked)} />} label="Granulating" />
          )}
        />
      </Stack>
      <FormControlLabel
        control={
          <Checkbox
            checked={Boolean(swatch)}
            onChange={(e) => form.setValue('swatchLab', e.target.checked ? { L: 50, a: 0, b: 0 } : null, { shouldDirty: true })}
          />
        }
        label="I have measured a swatch of it (CIELAB)"
      />
      {swatch && (
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'flex-start' } }}>
          <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
            {labField('L', 'L*')}
            {labField('a', 'a*')}
            {labField('b', 'b*')}
          </Stack>
          {isWholeLab(swatch) && (
            <SwatchStage sx={{ p: 1.5, alignSelf: 'flex-start' }}>
              <ColourSwatch lab={swatch} caption="This paint's swatch" size={64} />
            </SwatchStage>
          )}
        </Stack>
      )}
      <MeasurePaintSwatch
        onReading={(lab) => form.setValue('swatchLab', lab, { shouldDirty: true, shouldValidate: true })}
      />
      <Stack direction="row" spacing={1}>
        <Button type="submit" variant="contained" loading={saving}>
          {paint ? 'Save paint' : 'Add paint'}
        </Button>
        {paint && (
          <Button onClick={onDone} disabled={saving}>
            Cancel
          </Button>
        )}
      </Stack>
    </Stack>
  );
}
