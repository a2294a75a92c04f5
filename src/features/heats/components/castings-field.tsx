import { Plus, Trash2 } from 'lucide-react';
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { MOLD_MATERIAL_LABELS } from '#shared/domain/index.ts';
import type { Mould } from '#shared/heats/equipment-schemas.ts';
import { QUENCH_MEDIA, type QuenchMedium } from '#shared/heats/heat-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Caution } from '#src/components/ui/caution.tsx';
import { FieldError } from '#src/components/ui/field-parts.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { TextareaField } from '#src/components/ui/textarea-field.tsx';
import { massSymbol, temperatureSymbol, type Units } from '#src/lib/unit-input.ts';
import { emptyCasting, type CastingValues, type HeatFormValues } from '../lib/heat-form-values.ts';
import { TriStateField } from './tri-state-field.tsx';

export const QUENCH_LABELS: Record<QuenchMedium, string> = {
  none: 'none, cooled in air',
  water: 'water',
  other: 'other',
};

type CastingsFieldProps = { moulds: readonly Mould[]; units: Units; defaultMouldId: string | null };

/** The pours from this heat, one row each; a casting's mass can wait until it is weighed. */
export function CastingsField({ moulds, units, defaultMouldId }: CastingsFieldProps) {
  const { control, formState } = useFormContext<HeatFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: 'castings' });
  const listError = formState.errors.castings?.message ?? formState.errors.castings?.root?.message;

  return (
    <div className="flex flex-col gap-3">
      {fields.length === 0 ? (
        <p className="text-body text-ink-muted">No castings yet. Add one for each mould you pour; photos and defects hang on the casting.</p>
      ) : (
        <ol className="flex flex-col gap-4" aria-label="Castings">
          {fields.map((field, i) => (
            <li key={field.id}>
              <CastingRow index={i} initial={field} moulds={moulds} units={units} onRemove={() => remove(i)} />
            </li>
          ))}
        </ol>
      )}
      <FieldError id="castings" message={listError} />
      <Button className="self-start" icon={<Plus aria-hidden className="size-4" />} onClick={() => append(emptyCasting(defaultMouldId ?? ''))}>
        Add a casting
      </Button>
    </div>
  );
}

function CastingRow({
  index: i,
  initial,
  moulds,
  units,
  onRemove,
}: {
  index: number;
  /** The row's first values (selects take them as props; see HeatForm). */
  initial: Pick<CastingValues, 'mouldId' | 'quenchMedium'>;
  moulds: readonly Mould[];
  units: Units;
  onRemove: () => void;
}) {
  const { control, register, formState } = useFormContext<HeatFormValues>();
  const errors = formState.errors.castings?.[i];
  const quench = useWatch<HeatFormValues, `castings.${number}.quenchMedium`>({ name: `castings.${i}.quenchMedium` });
  const t = temperatureSymbol(units.temperatureUnit);

  return (
    <fieldset className="flex flex-col gap-4 rounded-md border border-line p-3">
      <legend className="px-1 text-body font-semibold text-ink">Casting {i + 1}</legend>
      <SelectField label="Mould" error={errors?.mouldId?.message} defaultValue={initial.mouldId} {...register(`castings.${i}.mouldId`)}>
        <option value="">Not recorded</option>
        {moulds.map((m) => (
          <option key={m.id} value={m.id}>
            {m.name} ({MOLD_MATERIAL_LABELS[m.material]})
          </option>
        ))}
      </SelectField>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Mould preheat" inputMode="decimal" autoComplete="off" suffix={t} error={errors?.mouldPreheat?.message} {...register(`castings.${i}.mouldPreheat`)} />
        <TextField
          label="Mass as weighed"
          inputMode="decimal"
          autoComplete="off"
          suffix={massSymbol(units.massUnit)}
          hint="Leave empty until it is weighed"
          error={errors?.mass?.message}
          {...register(`castings.${i}.mass`)}
        />
        <TextField label="Pour height" inputMode="decimal" autoComplete="off" suffix="cm" error={errors?.pourHeightCm?.message} {...register(`castings.${i}.pourHeightCm`)} />
        <TextField
          label="Thickest section"
          inputMode="decimal"
          autoComplete="off"
          suffix="mm"
          error={errors?.sectionThicknessMm?.message}
          {...register(`castings.${i}.sectionThicknessMm`)}
        />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <TriStateField control={control} name={`castings.${i}.coated`} legend="Mould coated" />
        <TriStateField control={control} name={`castings.${i}.vented`} legend="Mould vented" />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Quench" error={errors?.quenchMedium?.message} defaultValue={initial.quenchMedium} {...register(`castings.${i}.quenchMedium`)}>
          {QUENCH_MEDIA.map((q) => (
            <option key={q} value={q}>
              {QUENCH_LABELS[q]}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Minutes in air first"
          inputMode="decimal"
          autoComplete="off"
          suffix="min"
          error={errors?.airCoolMin?.message}
          {...register(`castings.${i}.airCoolMin`)}
        />
      </div>
      {quench === 'none' ? null : (
        <Caution heading="Metal goes into water, never water onto metal" safetySection="quenching">
          Lower the casting into plenty of water with tongs, at arm’s length, and stand clear of the steam.
        </Caution>
      )}
      <TextareaField label="Notes on this casting" rows={2} error={errors?.notes?.message} {...register(`castings.${i}.notes`)} />
      <Button size="sm" variant="quiet" className="self-start" icon={<Trash2 aria-hidden className="size-4" />} onClick={onRemove}>
        Remove casting {i + 1}
      </Button>
    </fieldset>
  );
}
