import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import type { AlloyEntry, WorkshopAlloyCreateInput, WorkshopAlloyUpdateInput } from '#shared/alloys/alloy-schemas.ts';
import { ALLOY_FAMILIES, findAlloy, type Alloy } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { FieldError } from '#src/components/ui/field-parts.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { temperatureSymbol, type Units } from '#src/lib/unit-input.ts';
import { useCreateAlloy } from '../api/use-create-alloy.ts';
import { useUpdateAlloy } from '../api/use-update-alloy.ts';
import {
  alloyCreateFormSchema,
  alloyUpdateFormSchema,
  EMPTY_ALLOY_FORM,
  formFieldOfApiPath,
  formValuesFromBase,
  formValuesOf,
  type AlloyFormValues,
} from '../lib/alloy-form-values.ts';
import { FAMILY_LABELS } from '../lib/alloy-figures.ts';

type WorkshopAlloyFormProps = {
  workshopId: string;
  units: Units;
  /** The library's alloys, to base a workshop alloy on. */
  library: readonly Alloy[];
  /** The workshop alloy to edit; a new one when absent. */
  editing?: AlloyEntry;
  onDone: (designation: string) => void;
  onCancel: () => void;
};

/**
 * Add or edit one of the workshop's own alloys. Basing it on a library alloy
 * fills in that alloy's values; values left as they are keep the library's
 * citation, values changed are the workshop's and its note speaks for them.
 */
export function WorkshopAlloyForm({ workshopId, units, library, editing, onDone, onCancel }: WorkshopAlloyFormProps) {
  const create = useCreateAlloy(workshopId);
  const update = useUpdateAlloy(workshopId);
  const [problem, setProblem] = useState<string | null>(null);
  const current = editing?.alloy;
  const resolver = useMemo(
    () =>
      (current
        ? zodResolver(alloyUpdateFormSchema(units, current))
        : zodResolver(alloyCreateFormSchema(units))) as unknown as Resolver<AlloyFormValues, unknown, WorkshopAlloyCreateInput | WorkshopAlloyUpdateInput>,
    [current, units],
  );
  const form = useForm<AlloyFormValues, unknown, WorkshopAlloyCreateInput | WorkshopAlloyUpdateInput>({
    resolver,
    defaultValues: current ? formValuesOf(current, units) : EMPTY_ALLOY_FORM,
  });
  const { errors } = form.formState;
  const t = temperatureSymbol(units.temperatureUnit);
  const basedOn = form.watch('basedOn');
  const pending = create.isPending || update.isPending;

  const onError = (error: unknown) => {
    if (isApiError(error, 'validation-failed') && error.issues.length > 0) {
      error.issues.forEach((issue, i) =>
        form.setError(formFieldOfApiPath(issue.path), { type: 'server', message: issue.message }, { shouldFocus: i === 0 }),
      );
      setProblem(null);
      return;
    }
    setProblem(isApiError(error) ? error.message : 'Something went wrong. Try again.');
  };

  const onSubmit = form.handleSubmit((input) => {
    setProblem(null);
    if (editing?.id) {
      update.mutate(
        { alloyId: editing.id, input: input as WorkshopAlloyUpdateInput },
        { onSuccess: (entry) => onDone(entry.alloy.designation), onError },
      );
    } else {
      create.mutate(input as WorkshopAlloyCreateInput, { onSuccess: (entry) => onDone(entry.alloy.designation), onError });
    }
  });

  const chooseBase = (designation: string) => {
    const base = designation ? findAlloy(designation) : undefined;
    const keep = form.getValues();
    form.reset(base ? formValuesFromBase(base, units, keep) : { ...keep, basedOn: '' }, { keepDefaultValues: true });
  };

  const number = (name: keyof AlloyFormValues, label: string, suffix: string, hint?: string) => (
    <TextField label={label} inputMode="decimal" autoComplete="off" suffix={suffix} hint={hint} error={errors[name]?.message} {...form.register(name)} />
  );

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label={editing ? `Edit ${editing.alloy.designation}` : 'Add a workshop alloy'}>
      {problem ? (
        <Notice tone="danger" role="alert" title={editing ? 'Not saved' : 'Alloy not added'}>
          {problem}
        </Notice>
      ) : null}

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-body font-semibold text-ink">Name</legend>
        <TextField
          label="Designation"
          hint="What your members will pick, e.g. “wheel scrap”. Not a library name."
          autoComplete="off"
          error={errors.designation?.message}
          {...form.register('designation')}
        />
        {editing ? (
          <p className="self-end text-body text-ink-muted">{current?.basedOn ? `Based on ${current.basedOn}.` : 'Entered from scratch.'}</p>
        ) : (
          <SelectField
            label="Based on"
            hint="Fills in that alloy's values and citations; change any you know better."
            error={errors.basedOn?.message}
            {...form.register('basedOn', { onChange: (e: { target: { value: string } }) => chooseBase(e.target.value) })}
          >
            <option value="">No base: enter every value</option>
            {library.map((a) => (
              <option key={a.designation} value={a.designation}>
                {a.designation}: {a.commonName}
              </option>
            ))}
          </SelectField>
        )}
        <TextField
          label="Description"
          hint={basedOn && !editing ? `Left empty: “… (assumed ${basedOn})”.` : undefined}
          autoComplete="off"
          error={errors.commonName?.message}
          {...form.register('commonName')}
        />
        <SelectField label="Family" error={errors.family?.message} {...form.register('family')}>
          <option value="">Choose a family</option>
          {ALLOY_FAMILIES.map((f) => (
            <option key={f} value={f}>
              {FAMILY_LABELS[f]}
            </option>
          ))}
        </SelectField>
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-body font-semibold text-ink">Freezing, in {t}</legend>
        {number('solidusC', 'Solidus', t, 'Where the last liquid freezes.')}
        {number('liquidusC', 'Liquidus', t, 'Where freezing starts; superheat counts from here.')}
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-body font-semibold text-ink">Pouring ranges, in {t}</legend>
        {number('sandMin', 'Sand mould, from', t)}
        {number('sandMax', 'Sand mould, to', t)}
        {number('permanentMouldMin', 'Permanent mould, from', t)}
        {number('permanentMouldMax', 'Permanent mould, to', t)}
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-body font-semibold text-ink">Density and shrinkage</legend>
        {number('densityGcm3', 'Density (solid)', 'g/cm³', 'As alloy tables print it.')}
        {number('patternShrinkPct', 'Pattern allowance', '%', '5/32 in/ft is 1.3 %.')}
        {number('shrinkageMin', 'Volumetric shrinkage, from', '%')}
        {number('shrinkageMax', 'Volumetric shrinkage, to', '%')}
      </fieldset>

      <div className="flex flex-col gap-1.5">
        <label htmlFor="alloy-source-note" className="text-body font-medium text-ink">
          Where these values come from
        </label>
        <p id="alloy-source-note-hint" className="text-caption text-ink-muted">
          A supplier's sheet, your own test, or why you assume the base alloy. Shown beside the values in the library.
        </p>
        <textarea
          id="alloy-source-note"
          rows={3}
          aria-invalid={errors.source ? true : undefined}
          aria-describedby={['alloy-source-note-hint', errors.source ? 'alloy-source-note-error' : null].filter(Boolean).join(' ')}
          className="block w-full rounded-md border border-line-strong bg-surface-raised p-3 text-body text-ink aria-invalid:border-2 aria-invalid:border-danger-line"
          {...form.register('source')}
        />
        <FieldError id="alloy-source-note" message={errors.source?.message} />
      </div>

      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary" pending={pending} pendingLabel="Saving…">
          {editing ? 'Save changes' : 'Add alloy'}
        </Button>
        <Button onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}
