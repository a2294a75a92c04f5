import { Check } from 'lucide-react';
import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';
import { cn } from '#src/lib/cn.ts';

type CheckboxFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'children'> & {
  label: ReactNode;
  hint?: ReactNode;
  ref?: Ref<HTMLInputElement>;
};

/**
 * A native checkbox inside a 48 px label row, so the whole row is the target
 * for a gloved finger. The tick is drawn (not colour alone) when checked.
 */
export function CheckboxField({ label, hint, id, className, ref, ...inputProps }: CheckboxFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <div className={cn('flex flex-col', className)}>
      <label
        htmlFor={fieldId}
        className="flex min-h-12 cursor-pointer items-center gap-3 rounded-md border border-line-strong bg-surface-raised px-3 has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-focus lg:min-h-10"
      >
        <span className="relative flex size-6 shrink-0 items-center justify-center">
          <input
            ref={ref}
            id={fieldId}
            type="checkbox"
            aria-describedby={hint ? `${fieldId}-hint` : undefined}
            className="peer absolute inset-0 size-6 cursor-pointer appearance-none rounded border-2 border-ink bg-surface-raised checked:bg-ink"
            {...inputProps}
          />
          <Check aria-hidden strokeWidth={3} className="pointer-events-none relative size-4 text-surface opacity-0 peer-checked:opacity-100" />
        </span>
        <span className="text-body text-ink">{label}</span>
      </label>
      {hint ? (
        <p id={`${fieldId}-hint`} className="mt-1 text-caption text-ink-muted">
          {hint}
        </p>
      ) : null}
    </div>
  );
}
