import { ChevronDown } from 'lucide-react';
import { useId, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';
import { cn } from '#src/lib/cn.ts';
import { controlClasses, describedBy, FieldError, FieldHint } from './field-parts.tsx';

type SelectFieldProps = SelectHTMLAttributes<HTMLSelectElement> & {
  label: ReactNode;
  /** Keeps the label for screen readers only, where the context already says it. */
  hideLabel?: boolean;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLSelectElement>;
};

/** A native select: keyboard, screen reader and phone pickers work as people expect. */
export function SelectField({ label, hideLabel, hint, error, id, className, children, ref, ...selectProps }: SelectFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <div className={cn('flex flex-col gap-1.5', className)}>
      <label htmlFor={fieldId} className={hideLabel ? 'sr-only' : 'text-body font-medium text-ink'}>
        {label}
      </label>
      <FieldHint id={fieldId}>{hint}</FieldHint>
      <div className="relative">
        <select
          ref={ref}
          id={fieldId}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(fieldId, hint, error)}
          className={cn(controlClasses, 'appearance-none pr-10')}
          {...selectProps}
        >
          {children}
        </select>
        <ChevronDown aria-hidden className="pointer-events-none absolute top-1/2 right-3 size-4 -translate-y-1/2 text-ink-muted" />
      </div>
      <FieldError id={fieldId} message={error} />
    </div>
  );
}
