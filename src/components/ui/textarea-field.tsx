import { useId, type ReactNode, type Ref, type TextareaHTMLAttributes } from 'react';
import { cn } from '#src/lib/cn.ts';
import { controlClasses, describedBy, FieldError, FieldHint } from './field-parts.tsx';

type TextareaFieldProps = TextareaHTMLAttributes<HTMLTextAreaElement> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLTextAreaElement>;
};

/** A labelled multi-line input with its hint and error. */
export function TextareaField({ label, hint, error, id, className, rows = 3, ref, ...rest }: TextareaFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <div className={cn('flex flex-col gap-1.5', className)}>
      <label htmlFor={fieldId} className="text-body font-medium text-ink">
        {label}
      </label>
      <FieldHint id={fieldId}>{hint}</FieldHint>
      <textarea
        ref={ref}
        id={fieldId}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        className={cn(controlClasses, 'py-2')}
        {...rest}
      />
      <FieldError id={fieldId} message={error} />
    </div>
  );
}
