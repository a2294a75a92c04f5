import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';
import { cn } from '#src/lib/cn.ts';
import { controlClasses, describedBy, FieldError, FieldHint } from './field-parts.tsx';

type TextFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'children'> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  /** Text after the input, such as a unit ("°C", "g"). */
  suffix?: ReactNode;
  ref?: Ref<HTMLInputElement>;
};

/**
 * A labelled input with its hint and error. Pass `inputMode="decimal"` or
 * `"numeric"` for figures so phones open the number keypad.
 */
export function TextField({ label, hint, error, suffix, id, className, ref, ...inputProps }: TextFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <div className={cn('flex flex-col gap-1.5', className)}>
      <label htmlFor={fieldId} className="text-body font-medium text-ink">
        {label}
      </label>
      <FieldHint id={fieldId}>{hint}</FieldHint>
      <div className="flex items-center gap-2">
        <input
          ref={ref}
          id={fieldId}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(fieldId, hint, error)}
          className={cn(controlClasses, inputProps.inputMode === 'decimal' || inputProps.inputMode === 'numeric' ? 'figures' : '')}
          {...inputProps}
        />
        {suffix ? <span className="figures shrink-0 text-body text-ink-muted">{suffix}</span> : null}
      </div>
      <FieldError id={fieldId} message={error} />
    </div>
  );
}
