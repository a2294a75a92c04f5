import { Controller, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import { SegmentedControl } from '#src/components/ui/segmented-control.tsx';
import type { TriState } from '../lib/heat-form-values.ts';

const OPTIONS: { value: TriState; label: string }[] = [
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
  { value: '', label: 'Not recorded' },
];

/** Yes, no, or left unrecorded: a missing answer is not a "no" to the diagnosis. */
export function TriStateField<T extends FieldValues, TOut = T>({
  control,
  name,
  legend,
}: {
  control: Control<T, unknown, TOut>;
  name: FieldPath<T>;
  legend: string;
}) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => <SegmentedControl<TriState> legend={legend} options={OPTIONS} value={field.value as TriState} onChange={field.onChange} />}
    />
  );
}
