import { useId, useState, type FormEvent } from 'react';
import { HEAT_CONDITION_LABELS } from '#shared/domain/index.ts';
import type { HeatConditionField, TemperatureUnit } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { CHARGE_OPTIONS, CONDITION_INPUTS, toCelsius, type ConditionPatch, type RecordContext } from '../lib/condition-inputs.ts';

export type RecordProps = {
  temperatureUnit: TemperatureUnit;
  context: RecordContext;
  /** Where fields that need equipment picked are filled in. */
  heatFormHref: string;
  onRecord: (patches: ConditionPatch[]) => Promise<unknown>;
  pending?: boolean;
};

function parseNumber(text: string): number | null {
  const n = Number(text.trim().replace(',', '.'));
  return text.trim() === '' || !Number.isFinite(n) ? null : n;
}

/** One "not recorded" field, filled in where it is missing, without leaving the page. */
export function RecordConditionField({ field, autoFocus = false, ...props }: RecordProps & { field: HeatConditionField; autoFocus?: boolean }) {
  const spec = CONDITION_INPUTS[field];
  const label = HEAT_CONDITION_LABELS[field];
  const [value, setValue] = useState('');
  const [mass, setMass] = useState('');
  const [error, setError] = useState<string | undefined>();
  const formId = useId();

  if (spec.kind === 'heat-form') {
    return (
      <p className="text-body text-ink">
        The {label} comes from the mould or crucible picked for the heat: <TextLink to={props.heatFormHref}>record it on the heat form</TextLink>.
      </p>
    );
  }

  const save = async (patch: ConditionPatch | null) => {
    if (!patch) return;
    setError(undefined);
    try {
      await props.onRecord([patch]);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'Not saved');
    }
  };

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    if (spec.kind === 'temperature') {
      const n = parseNumber(value);
      if (n === null) return setError(`Type the ${label} in °${props.temperatureUnit}`);
      const c = toCelsius(n, props.temperatureUnit);
      if (c < spec.min || c > spec.max) return setError(`Between ${spec.min} and ${spec.max} °C`);
      return void save(spec.toPatch(c));
    }
    if (spec.kind === 'number') {
      const n = parseNumber(value);
      if (n === null) return setError(`Type the ${label} in ${spec.unit}`);
      if (n < spec.min || n > spec.max) return setError(`Between ${spec.min} and ${spec.max} ${spec.unit}`);
      return void save(spec.toPatch(n, props.context));
    }
    if (spec.kind === 'choice' || spec.kind === 'yes-no') {
      if (!value) return setError('Pick one');
      return void save(spec.kind === 'choice' ? spec.toPatch(value) : spec.toPatch(value === 'yes'));
    }
    const g = parseNumber(mass);
    if (!value) return setError('Pick the charge');
    if (g === null || g <= 0) return setError('Type the charge mass in g');
    return void save(spec.toPatch(value, g));
  };

  const inputLabel = `${label[0]?.toUpperCase()}${label.slice(1)}`;
  return (
    <form id={formId} onSubmit={onSubmit} className="flex flex-wrap items-end gap-2" aria-label={`Record the ${label}`}>
      {spec.kind === 'temperature' || spec.kind === 'number' ? (
        <TextField
          label={inputLabel}
          inputMode="decimal"
          autoFocus={autoFocus}
          value={value}
          onChange={(e) => setValue(e.target.value)}
          suffix={spec.kind === 'temperature' ? `°${props.temperatureUnit}` : spec.unit}
          error={error}
          className="w-40"
        />
      ) : spec.kind === 'charge' ? (
        <>
          <SelectField label="Charge" value={value} onChange={(e) => setValue(e.target.value)} autoFocus={autoFocus} error={error}>
            <option value="">Pick…</option>
            {CHARGE_OPTIONS.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </SelectField>
          <TextField label="Charge mass" inputMode="decimal" value={mass} onChange={(e) => setMass(e.target.value)} suffix="g" className="w-36" />
        </>
      ) : (
        <SelectField label={inputLabel} value={value} onChange={(e) => setValue(e.target.value)} autoFocus={autoFocus} error={error}>
          <option value="">Pick…</option>
          {(spec.kind === 'yes-no' ? [{ value: 'yes', label: 'yes' }, { value: 'no', label: 'no' }] : spec.options).map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </SelectField>
      )}
      <Button type="submit" pending={props.pending} pendingLabel="Saving…">
        Save {label}
      </Button>
    </form>
  );
}
