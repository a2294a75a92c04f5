import { Plus, Trash2 } from 'lucide-react';
import { useFieldArray, useFormContext } from 'react-hook-form';
import { CHARGE_KIND_LABELS, CHARGE_KINDS } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { FieldError } from '#src/components/ui/field-parts.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { massSymbol, type Units } from '#src/lib/unit-input.ts';
import { emptyChargeLine, type HeatFormValues } from '../lib/heat-form-values.ts';

/** What went into the crucible: one row per kind of metal, with its mass in the user's unit. */
export function ChargeLinesField({ units }: { units: Units }) {
  const { control, register, formState } = useFormContext<HeatFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: 'chargeLines' });
  const errors = formState.errors.chargeLines;
  const listError = errors?.message ?? errors?.root?.message;

  return (
    <div className="flex flex-col gap-3">
      <ol className="flex flex-col gap-3" aria-label="Charge lines">
        {fields.map((field, i) => (
          <li key={field.id}>
            <fieldset className="flex flex-col gap-3 rounded-md border border-line p-3">
              <legend className="px-1 text-body font-semibold text-ink">Charge line {i + 1}</legend>
              <div className="grid gap-3 sm:grid-cols-[10rem_1fr_9rem]">
                <SelectField label="Kind" error={errors?.[i]?.kind?.message} defaultValue={field.kind} {...register(`chargeLines.${i}.kind`)}>
                  {CHARGE_KINDS.map((kind) => (
                    <option key={kind} value={kind}>
                      {CHARGE_KIND_LABELS[kind]}
                    </option>
                  ))}
                </SelectField>
                <TextField
                  label="What it was"
                  placeholder="e.g. wheel offcuts"
                  autoComplete="off"
                  error={errors?.[i]?.description?.message}
                  {...register(`chargeLines.${i}.description`)}
                />
                <TextField
                  label="Mass"
                  inputMode="decimal"
                  autoComplete="off"
                  suffix={massSymbol(units.massUnit)}
                  error={errors?.[i]?.mass?.message}
                  {...register(`chargeLines.${i}.mass`)}
                />
              </div>
              {fields.length > 1 ? (
                <Button size="sm" variant="quiet" className="self-start" icon={<Trash2 aria-hidden className="size-4" />} onClick={() => remove(i)}>
                  Remove charge line {i + 1}
                </Button>
              ) : null}
            </fieldset>
          </li>
        ))}
      </ol>
      <FieldError id="charge-lines" message={listError} />
      <Button className="self-start" icon={<Plus aria-hidden className="size-4" />} onClick={() => append(emptyChargeLine())}>
        Add a charge line
      </Button>
    </div>
  );
}
