import { useId } from 'react';
import { cn } from '#src/lib/cn.ts';

export type SegmentOption<T extends string> = { value: T; label: string; description?: string };

type SegmentedControlProps<T extends string> = {
  legend: string;
  hideLegend?: boolean;
  name?: string;
  options: readonly SegmentOption<T>[];
  value: T;
  onChange: (value: T) => void;
  disabled?: boolean;
  /** Monospace labels, for units such as °C and g. */
  mono?: boolean;
  className?: string;
};

/**
 * A row of choices that behaves as a radio group (arrow keys move, one is
 * chosen). The chosen one is inverted (ink on paper becomes paper on ink),
 * a change of lightness rather than of hue; screen readers hear the radio.
 */
export function SegmentedControl<T extends string>({
  legend,
  hideLegend,
  name,
  options,
  value,
  onChange,
  disabled,
  mono,
  className,
}: SegmentedControlProps<T>) {
  const autoName = useId();
  const groupName = name ?? autoName;
  return (
    <fieldset className={cn('flex flex-col gap-1.5', className)} disabled={disabled}>
      <legend className={hideLegend ? 'sr-only' : 'mb-1.5 text-body font-medium text-ink'}>{legend}</legend>
      <div className="inline-flex w-full rounded-md border border-line-strong bg-surface-raised p-0.5">
        {options.map((option) => (
          <label
            key={option.value}
            className={cn(
              'relative flex min-h-12 flex-1 cursor-pointer items-center justify-center rounded px-3 text-body font-medium lg:min-h-10',
              'has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-focus',
              option.value === value ? 'bg-ink text-surface' : 'text-ink hover:bg-surface-sunken',
            )}
          >
            <input
              type="radio"
              className="sr-only"
              name={groupName}
              value={option.value}
              checked={option.value === value}
              onChange={() => onChange(option.value)}
            />
            <span className={mono ? 'figures' : undefined}>{option.label}</span>
            {option.description ? <span className="sr-only"> {option.description}</span> : null}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
