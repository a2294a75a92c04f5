import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState, type ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { ALLOYS, MOLD_MATERIAL_LABELS, MOLD_MATERIALS } from '#shared/domain/index.ts';
import { CRUCIBLE_MATERIAL_LABELS, CRUCIBLE_MATERIALS } from '#shared/heats/crucible-life.ts';
import {
  FURNACE_KIND_LABELS,
  FURNACE_KINDS,
  type Crucible,
  type CrucibleCreateInput,
  type Furnace,
  type FurnaceCreateInput,
  type FurnaceUpdateInput,
  type Mould,
  type MouldCreateInput,
} from '#shared/heats/equipment-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { CheckboxField } from '#src/components/ui/checkbox-field.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { TextareaField } from '#src/components/ui/textarea-field.tsx';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { massSymbol, type Units } from '#src/lib/unit-input.ts';
import { useCreateCrucible } from '../api/use-create-crucible.ts';
import { useCreateFurnace } from '../api/use-create-furnace.ts';
import { useCreateMould } from '../api/use-create-mould.ts';
import { useUpdateCrucible } from '../api/use-update-crucible.ts';
import { useUpdateFurnace } from '../api/use-update-furnace.ts';
import { useUpdateMould } from '../api/use-update-mould.ts';
import {
  changedFields,
  crucibleFormSchema,
  crucibleFormValues,
  furnaceFormSchema,
  furnaceFormValues,
  mouldFormSchema,
  mouldFormValues,
  type CrucibleFormValues,
  type FurnaceFormValues,
  type MouldFormValues,
} from '../lib/equipment-form-values.ts';

// Registered selects take their default as a prop too: react-hook-form skips
// a select's default when its first option only looks selected (see HeatForm).

type FormShellProps = {
  label: string;
  problem: string | null;
  onSubmit: () => void;
  onCancel: () => void;
  pending: boolean;
  submitLabel: string;
  children: ReactNode;
};

function FormShell({ label, problem, onSubmit, onCancel, pending, submitLabel, children }: FormShellProps) {
  return (
    <form
      noValidate
      aria-label={label}
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit();
      }}
      className="flex flex-col gap-4 rounded-md border border-line bg-surface p-4"
    >
      {problem ? (
        <Notice tone="danger" role="alert" title="Not saved">
          {problem}
        </Notice>
      ) : null}
      {children}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary" pending={pending} pendingLabel="Saving…">
          {submitLabel}
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

type EditProps<T> = { workshopId: string; existing?: T; onDone: () => void };

/** Add or edit a furnace. */
export function FurnaceForm({ workshopId, existing, onDone }: EditProps<Furnace>) {
  const create = useCreateFurnace(workshopId);
  const update = useUpdateFurnace(workshopId);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<FurnaceFormValues, unknown, FurnaceCreateInput>({
    resolver: zodResolver(furnaceFormSchema()),
    defaultValues: furnaceFormValues(existing),
  });
  const initial = form.formState.defaultValues;
  const { errors } = form.formState;
  const submit = form.handleSubmit(async (saved) => {
    setProblem(null);
    try {
      const furnace = existing
        ? await update.mutateAsync({ furnaceId: existing.id, input: changedFields(saved, form.formState.dirtyFields) as FurnaceUpdateInput })
        : await create.mutateAsync(saved);
      toast.success(existing ? `${furnace.name} saved.` : `${furnace.name} added.`);
      onDone();
    } catch (error) {
      setProblem(applyServerErrors(error, form.setError, ['name', 'kind', 'notes']));
    }
  });
  return (
    <FormShell
      label={existing ? `Edit ${existing.name}` : 'Add a furnace'}
      problem={problem}
      onSubmit={() => void submit()}
      onCancel={onDone}
      pending={form.formState.isSubmitting}
      submitLabel={existing ? 'Save the furnace' : 'Add the furnace'}
    >
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...form.register('name')} />
        <SelectField label="Kind" error={errors.kind?.message} defaultValue={initial?.kind} {...form.register('kind')}>
          {FURNACE_KINDS.map((k) => (
            <option key={k} value={k}>
              {FURNACE_KIND_LABELS[k]}
            </option>
          ))}
        </SelectField>
      </div>
      <TextareaField label="Notes" rows={2} error={errors.notes?.message} {...form.register('notes')} />
    </FormShell>
  );
}

/** Add or edit a crucible (retiring has its own button). */
export function CrucibleForm({ workshopId, existing, onDone, units }: EditProps<Crucible> & { units: Units }) {
  const create = useCreateCrucible(workshopId);
  const update = useUpdateCrucible(workshopId);
  const [problem, setProblem] = useState<string | null>(null);
  const { massUnit } = units;
  const schema = useMemo(() => crucibleFormSchema(massUnit), [massUnit]);
  const form = useForm<CrucibleFormValues, unknown, CrucibleCreateInput>({
    resolver: zodResolver(schema),
    defaultValues: crucibleFormValues(existing, units),
  });
  const initial = form.formState.defaultValues;
  const { errors } = form.formState;
  const submit = form.handleSubmit(async (saved) => {
    setProblem(null);
    try {
      const crucible = existing
        ? await update.mutateAsync({ crucibleId: existing.id, input: changedFields(saved, form.formState.dirtyFields) })
        : await create.mutateAsync(saved);
      toast.success(existing ? `${crucible.name} saved.` : `${crucible.name} added.`);
      onDone();
    } catch (error) {
      setProblem(applyServerErrors(error, form.setError, ['name', 'material', 'inServiceSince']));
    }
  });
  return (
    <FormShell
      label={existing ? `Edit ${existing.name}` : 'Add a crucible'}
      problem={problem}
      onSubmit={() => void submit()}
      onCancel={onDone}
      pending={form.formState.isSubmitting}
      submitLabel={existing ? 'Save the crucible' : 'Add the crucible'}
    >
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Name" autoComplete="off" hint="What is written on it, e.g. “A8 salamander”" error={errors.name?.message} {...form.register('name')} />
        <SelectField label="Material" error={errors.material?.message} defaultValue={initial?.material} {...form.register('material')}>
          {CRUCIBLE_MATERIALS.map((m) => (
            <option key={m} value={m}>
              {CRUCIBLE_MATERIAL_LABELS[m]}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Capacity"
          inputMode="decimal"
          autoComplete="off"
          suffix={massSymbol(massUnit)}
          hint="Aluminium it holds"
          error={errors.capacity?.message}
          {...form.register('capacity')}
        />
        <TextField label="In service since" type="date" error={errors.inServiceSince?.message} {...form.register('inServiceSince')} />
      </div>
    </FormShell>
  );
}

/** Add or edit a mould. */
export function MouldForm({ workshopId, existing, onDone, units }: EditProps<Mould> & { units: Units }) {
  const create = useCreateMould(workshopId);
  const update = useUpdateMould(workshopId);
  const [problem, setProblem] = useState<string | null>(null);
  const { massUnit } = units;
  const schema = useMemo(() => mouldFormSchema(massUnit), [massUnit]);
  const form = useForm<MouldFormValues, unknown, MouldCreateInput>({
    resolver: zodResolver(schema),
    defaultValues: mouldFormValues(existing, units),
  });
  const initial = form.formState.defaultValues;
  const { errors } = form.formState;
  const submit = form.handleSubmit(async (saved) => {
    setProblem(null);
    try {
      const mould = existing
        ? await update.mutateAsync({ mouldId: existing.id, input: changedFields(saved, form.formState.dirtyFields) })
        : await create.mutateAsync(saved);
      toast.success(existing ? `${mould.name} saved.` : `${mould.name} added.`);
      onDone();
    } catch (error) {
      setProblem(applyServerErrors(error, form.setError, ['name', 'material', 'capacityAlloy', 'coating', 'notes']));
    }
  });
  return (
    <FormShell
      label={existing ? `Edit ${existing.name}` : 'Add a mould'}
      problem={problem}
      onSubmit={() => void submit()}
      onCancel={onDone}
      pending={form.formState.isSubmitting}
      submitLabel={existing ? 'Save the mould' : 'Add the mould'}
    >
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...form.register('name')} />
        <SelectField label="Material" error={errors.material?.message} defaultValue={initial?.material} {...form.register('material')}>
          {MOLD_MATERIALS.map((m) => (
            <option key={m} value={m}>
              {MOLD_MATERIAL_LABELS[m]}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Cavity holds"
          inputMode="decimal"
          autoComplete="off"
          suffix={massSymbol(massUnit)}
          hint="The casting's metal, without gating and risers; gives the weigh-out"
          error={errors.capacity?.message}
          {...form.register('capacity')}
        />
        <SelectField label="Weighed in" hint="The alloy that capacity is for" error={errors.capacityAlloy?.message} defaultValue={initial?.capacityAlloy} {...form.register('capacityAlloy')}>
          <option value="">Not recorded</option>
          {ALLOYS.map((a) => (
            <option key={a.designation} value={a.designation}>
              {a.designation}
            </option>
          ))}
        </SelectField>
        <TextField label="Coating" autoComplete="off" hint="e.g. boron nitride, graphite wash" error={errors.coating?.message} {...form.register('coating')} />
      </div>
      <CheckboxField label="Has a riser" {...form.register('hasRiser')} />
      <TextareaField label="Notes" rows={2} error={errors.notes?.message} {...form.register('notes')} />
    </FormShell>
  );
}
