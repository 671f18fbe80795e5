import { yupResolver } from '@hookform/resolvers/yup';
import {
  createDrillSchema,
  drillKinds,
  labToHex,
  labToLch,
  pigmentCautions,
  pigmentSafety,
  targetCountByKind,
  type CreateDrillInput,
  type DrillKind,
  type TargetInput,
} from '@mixmark/common';
import AddOutlined from '@mui/icons-material/AddOutlined';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import IconButton from '@mui/material/IconButton';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Controller, FormProvider, useFieldArray, useForm, useWatch } from 'react-hook-form';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { useCreateDrill } from '../api/create-drill';
import { useUpdateDrill } from '../api/update-drill';
import { kindWords, type Drill } from '../types';
import { PigmentCautions } from '@/components/colour/pigment-cautions';
import { PigmentsField } from '@/components/colour/pigments-field';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { toApiError } from '@/lib/api-client';
import { errorMessage, schemaSentence } from '@/lib/error-words';
import { defaultTargets, fitTargets, isDefaultTargets, ladderStep } from './kind-defaults';
import { MeasureSwatch } from './measure-swatch';
import { TargetField } from './target-field';

const optionalNumber = { setValueAs: (v: string | number | undefined) => (v === '' || v === undefined ? undefined : Number(v)) };

/** What the API stores (CIELAB with how it was entered) back to what the teacher typed. */
export function drillToForm(drill: Drill): CreateDrillInput {
  return {
    title: drill.title,
    kind: drill.kind,
    instructions: drill.instructions,
    visibility: drill.visibility,
    palette: drill.palette,
    tolerance: {
      deltaE: drill.tolerance.deltaE,
      maxChroma: drill.tolerance.maxChroma,
      evenness: drill.tolerance.evenness,
      minSeparation: drill.tolerance.minSeparation,
    },
    targets: drill.targets.map((target) => {
      const label = target.label ? { label: target.label } : {};
      if (target.enteredAs === 'hex') return { ...label, hex: labToHex(target.lab) };
      if (target.enteredAs === 'lch') {
        const lch = labToLch(target.lab);
        return { ...label, lch: { L: +lch.L.toFixed(1), C: +lch.C.toFixed(1), h: +lch.h.toFixed(1) } };
      }
      return { ...label, lab: { L: +target.lab.L.toFixed(1), a: +target.lab.a.toFixed(1), b: +target.lab.b.toFixed(1) } };
    }),
  };
}

/** A target's label, kept when its colour is replaced by a measured one. */
const labelOf = (target: TargetInput | undefined) => (target?.label ? { label: target.label } : {});

const emptyDrill: CreateDrillInput = {
  title: '',
  kind: 'match',
  instructions: '',
  targets: defaultTargets('match'),
  tolerance: {},
  palette: [],
  visibility: 'private',
};

const kindTolerance: Partial<Record<DrillKind, { field: 'maxChroma' | 'evenness' | 'minSeparation'; label: string }>> = {
  neutral: { field: 'maxChroma', label: 'Highest chroma that still reads as grey (C*)' },
  'value-ladder': { field: 'evenness', label: 'Largest step error (L*)' },
  'graded-wash': { field: 'evenness', label: 'Largest bump off a smooth gradient (L*)' },
  'flat-wash': { field: 'evenness', label: 'Largest unevenness (ΔE*ab)' },
  'temperature-pair': { field: 'minSeparation', label: 'Smallest difference between warm and cool (ΔE00)' },
};

/** Create or edit a drill: kind, targets (hex / Lab / LCh with a live swatch), tolerance, palette. */
export function DrillEditor({ drill, onSaved }: { drill?: Drill; onSaved: (saved: Drill) => void }) {
  const [formError, setFormError] = useState<string>();
  const form = useForm<CreateDrillInput>({
    resolver: yupResolver(createDrillSchema) as never,
    defaultValues: drill ? drillToForm(drill) : emptyDrill,
  });
  const targets = useFieldArray({ control: form.control, name: 'targets' });
  const palette = useFieldArray({ control: form.control, name: 'palette' });
  const kind = useWatch({ control: form.control, name: 'kind' });
  const paints = useWatch({ control: form.control, name: 'palette' }) ?? [];
  const create = useCreateDrill({ onSuccess: onSaved });
  const update = useUpdateDrill({ id: drill?.id ?? '', onSuccess: onSaved });
  const saving = create.isPending || update.isPending;
  const { errors } = form.formState;
  const [min, max] = targetCountByKind[kind];

  // A kind change waiting for the teacher's answer: their targets are not the defaults.
  const [pendingKind, setPendingKind] = useState<DrillKind>();

  const switchKind = (next: DrillKind, targetsFor: 'defaults' | 'keep') => {
    const replacement =
      targetsFor === 'defaults' ? defaultTargets(next) : fitTargets(next, form.getValues('targets'), targetCountByKind[next]);
    form.setValue('kind', next, { shouldDirty: true });
    targets.replace(replacement);
    form.clearErrors('targets');
    setPendingKind(undefined);
  };

  const onKindChange = (next: DrillKind) => {
    if (next === kind) return;
    if (isDefaultTargets(kind, form.getValues('targets'))) switchKind(next, 'defaults');
    else setPendingKind(next);
  };

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    const onError = (error: unknown) => {
      // A drill already assigned or attempted keeps its kind and target count: the server says why.
      if (toApiError(error).code === 'drill_in_use') return setFormError(errorMessage(error));
      setFormError(
        applyServerErrors(error, form.setError, ['title', 'kind', 'instructions', 'targets', 'tolerance', 'palette', 'visibility']),
      );
    };
    if (drill) update.mutate(values, { onError });
    else create.mutate(values, { onError });
  });

  const extra = kindTolerance[kind];

  return (
    <FormProvider {...form}>
      <Stack component="form" spacing={3} noValidate onSubmit={onSubmit}>
        {formError && <Alert severity="error">{formError}</Alert>}
        <Stack direction={{ xs: 'column', md: 'row' }} spacing={2}>
          <TextField
            label="Title"
            {...form.register('title')}
            error={Boolean(errors.title)}
            helperText={fieldHelp('title', errors.title)}
            sx={{ flexGrow: 1 }}
          />
          <Controller
            name="kind"
            control={form.control}
            render={({ field }) => (
              <TextField
                select
                label="Kind"
                {...field}
                onChange={(event) => onKindChange(event.target.value as DrillKind)}
                sx={{ minWidth: 220 }}
                helperText={kindWords[field.value].what}
              >
                {drillKinds.map((k) => (
                  <MenuItem key={k} value={k}>
                    {kindWords[k].name}
                  </MenuItem>
                ))}
              </TextField>
            )}
          />
        </Stack>
        <TextField
          label="Instructions for the student"
          multiline
          minRows={3}
          {...form.register('instructions')}
          error={Boolean(errors.instructions)}
          helperText={fieldHelp('instructions', errors.instructions)}
        />

        <Stack spacing={1.5}>
          <Typography variant="h3" component="h2">
            Targets
          </Typography>
          <Typography color="text.secondary" variant="body2">
            {min === max ? `A ${kindWords[kind].name.toLowerCase()} drill takes ${min} target${min > 1 ? 's' : ''}.` : `${min} to ${max} steps, lightest first.`}
          </Typography>
          <MeasureSwatch
            drillId={drill?.id}
            kind={kind}
            targetCount={targets.fields.length}
            onFill={(labs) => targets.replace(labs.map((lab, i) => ({ ...labelOf(form.getValues(`targets.${i}`)), lab })))}
            onUse={(index, lab) =>
              form.setValue(`targets.${index}`, { ...labelOf(form.getValues(`targets.${index}`)), lab }, { shouldDirty: true })
            }
          />
          {errors.targets?.root?.message || errors.targets?.message ? (
            <Alert severity="error">{schemaSentence(errors.targets?.root?.message ?? errors.targets?.message)}</Alert>
          ) : null}
          {targets.fields.map((field, index) => (
            <TargetField
              key={field.id}
              index={index}
              onRemove={targets.fields.length > min ? () => targets.remove(index) : undefined}
            />
          ))}
          {targets.fields.length < max && (
            <Button
              startIcon={<AddOutlined />}
              onClick={() => targets.append(ladderStep(targets.fields.length, targets.fields.length + 1))}
              sx={{ alignSelf: 'flex-start' }}
            >
              Add a step
            </Button>
          )}
        </Stack>

        <Stack spacing={1.5}>
          <Typography variant="h3" component="h2">
            Tolerance
          </Typography>
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
            <TextField
              label="Passing ΔE00"
              type="number"
              slotProps={{ htmlInput: { step: 0.5, min: 0.5, max: 50 } }}
              {...form.register('tolerance.deltaE', optionalNumber)}
              error={Boolean(errors.tolerance?.deltaE)}
              helperText={errors.tolerance?.deltaE ? 'A number above 0, at most 50.' : "Blank for the kind's default. Around 2 is close; 5 a near miss."}
              sx={{ minWidth: 280 }}
            />
            {extra && (
              <TextField
                key={extra.field}
                label={extra.label}
                type="number"
                slotProps={{ htmlInput: { step: 0.5, min: 0.5, max: 50 } }}
                {...form.register(`tolerance.${extra.field}`, optionalNumber)}
                error={Boolean(errors.tolerance?.[extra.field])}
                helperText={errors.tolerance?.[extra.field] ? 'A number above 0, at most 50.' : 'Blank for the default.'}
                sx={{ minWidth: 280 }}
              />
            )}
          </Stack>
        </Stack>

        <Stack spacing={1.5}>
          <Typography variant="h3" component="h2">
            Palette
          </Typography>
          <Typography variant="body2" color="text.secondary">
            The paints the drill allows; leave empty for any.
          </Typography>
          {palette.fields.map((field, index) => (
            <Stack key={field.id} direction={{ xs: 'column', sm: 'row' }} spacing={1} sx={{ alignItems: 'flex-start' }}>
              <TextField
                label={`Paint ${index + 1} name`}
                size="small"
                {...form.register(`palette.${index}.name`)}
                error={Boolean(errors.palette?.[index]?.name)}
                helperText={fieldHelp('name', errors.palette?.[index]?.name)}
              />
              <Controller
                name={`palette.${index}.pigments`}
                control={form.control}
                render={({ field: pigments }) => (
                  <PigmentsField
                    label={`Paint ${index + 1} pigments`}
                    value={pigments.value ?? []}
                    onChange={pigments.onChange}
                    error={Boolean(errors.palette?.[index]?.pigments)}
                    helperText={errors.palette?.[index]?.pigments ? fieldHelp('pigment', { type: 'pigment' } as never) : undefined}
                  />
                )}
              />
              <IconButton aria-label={`Remove paint ${index + 1}`} onClick={() => palette.remove(index)}>
                <DeleteOutlined />
              </IconButton>
            </Stack>
          ))}
          <Button
            startIcon={<AddOutlined />}
            onClick={() => palette.append({ name: '', pigments: [] })}
            sx={{ alignSelf: 'flex-start' }}
            disabled={palette.fields.length >= 12}
          >
            Add a paint
          </Button>
          <PigmentCautions notes={pigmentSafety(paints.flatMap((paint) => paint?.pigments ?? []))} cautions={pigmentCautions} />
        </Stack>

        <Controller
          name="visibility"
          control={form.control}
          render={({ field }) => (
            <TextField select label="Who can see it" {...field} sx={{ maxWidth: 360 }}>
              <MenuItem value="private">Only me and the classes I assign it to</MenuItem>
              <MenuItem value="public">Everyone, in the public practice library</MenuItem>
            </TextField>
          )}
        />
        <Button type="submit" variant="contained" size="large" loading={saving} sx={{ alignSelf: 'flex-start' }}>
          {drill ? 'Save the drill' : 'Create the drill'}
        </Button>
        <ConfirmDialog
          open={pendingKind !== undefined}
          title={`Replace the targets for a ${pendingKind ? kindWords[pendingKind].name.toLowerCase() : ''} drill?`}
          confirmLabel="Use the new defaults"
          cancelLabel={`Stay a ${kindWords[kind].name.toLowerCase()}`}
          extra={{ label: 'Keep my targets', onClick: () => pendingKind && switchKind(pendingKind, 'keep') }}
          onConfirm={() => pendingKind && switchKind(pendingKind, 'defaults')}
          onCancel={() => setPendingKind(undefined)}
        >
          {`You have entered targets of your own. The new kind's defaults would replace them; keeping them changes only the number of targets to what the new kind takes.`}
        </ConfirmDialog>
      </Stack>
    </FormProvider>
  );
}
