import { Eye, EyeOff } from 'lucide-react';
import { useId, useState, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';
import { cn } from '#src/lib/cn.ts';
import { controlClasses, describedBy, FieldError, FieldHint } from './field-parts.tsx';

type PasswordFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'children'> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLInputElement>;
};

/** A password input with a Show button, so a long passphrase can be checked before sending. */
export function PasswordField({ label, hint, error, id, className, ref, ...inputProps }: PasswordFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  const [visible, setVisible] = useState(false);
  return (
    <div className={cn('flex flex-col gap-1.5', className)}>
      <label htmlFor={fieldId} className="text-body font-medium text-ink">
        {label}
      </label>
      <FieldHint id={fieldId}>{hint}</FieldHint>
      <div className="flex items-stretch gap-2">
        <input
          ref={ref}
          id={fieldId}
          type={visible ? 'text' : 'password'}
          autoCapitalize="none"
          autoCorrect="off"
          spellCheck={false}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(fieldId, hint, error)}
          className={controlClasses}
          {...inputProps}
        />
        <button
          type="button"
          onClick={() => setVisible((v) => !v)}
          aria-pressed={visible}
          aria-controls={fieldId}
          className="flex min-h-12 shrink-0 items-center gap-1.5 rounded-md border border-line-strong bg-surface-raised px-3 text-caption font-medium text-ink lg:min-h-10"
        >
          {visible ? <EyeOff aria-hidden className="size-4" /> : <Eye aria-hidden className="size-4" />}
          Show
        </button>
      </div>
      <FieldError id={fieldId} message={error} />
    </div>
  );
}
