import { useId, type ReactNode } from 'react';
import type { SourceNote } from '#shared/domain/index.ts';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { cn } from '#src/lib/cn.ts';
import { parseDecimal } from '#src/lib/unit-input.ts';

// The pieces every calculator page shares: inputs on one side, the figures
// they give beside them, then how the figure is worked out and where the
// formula comes from.

/** A typed figure: a number, nothing yet (null), or text that is not a number. */
export const readNumber = (text: string) => parseDecimal(text);

/** Inputs beside results on a desk, results under inputs on a phone. */
export function CalculatorLayout({
  inputs,
  results,
  formula,
  sources,
  children,
}: {
  inputs: ReactNode;
  results: ReactNode;
  formula: ReactNode;
  sources: readonly (SourceNote | undefined)[];
  children?: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-6">
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <section aria-label="Inputs" className="flex flex-col gap-4 rounded-lg border border-line bg-surface-raised p-4 lg:p-5">
          {inputs}
        </section>
        <section aria-label="Results" className="flex flex-col gap-4 rounded-lg border border-line bg-surface-sunken p-4 lg:p-5">
          {results}
        </section>
      </div>
      {children}
      <section aria-labelledby="calc-formula" className="flex flex-col gap-2">
        <h2 id="calc-formula" className="text-title font-semibold text-ink">
          How it is worked out
        </h2>
        <div className="flex max-w-prose flex-col gap-2 text-body text-ink">{formula}</div>
      </section>
      <SourceList notes={sources} />
    </div>
  );
}

/** A formula line, in monospace so its symbols line up. */
export function Formula({ children }: { children: ReactNode }) {
  return <p className="figures rounded-md bg-surface-sunken px-3 py-2 text-body text-ink">{children}</p>;
}

const GRADE_WORDS: Record<SourceNote['grade'], string> = {
  primary: 'read in the source',
  secondary: 'secondary source',
  memory: 'from memory',
  practice: 'common practice',
  heuristic: 'app heuristic',
};

export function SourceList({ notes, title = 'Sources' }: { notes: readonly (SourceNote | undefined)[]; title?: string }) {
  const shown = notes.filter((n): n is SourceNote => n !== undefined);
  const headingId = useId();
  if (shown.length === 0) return null;
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-2">
      <h2 id={headingId} className="text-title font-semibold text-ink">
        {title}
      </h2>
      <ul className="flex max-w-prose list-disc flex-col gap-1 pl-5 text-body text-ink">
        {shown.map((note) => (
          <li key={note.citation}>
            {note.citation} <span className="text-caption text-ink-muted">[{GRADE_WORDS[note.grade]}]</span>
          </li>
        ))}
      </ul>
    </section>
  );
}

type NumberInputProps = {
  label: string;
  value: string;
  onChange: (text: string) => void;
  /** The unit after the input: "°F", "g", "%", "mm". */
  unit?: string;
  hint?: ReactNode;
  /** A problem the computation found with this input (zero, out of range). */
  problem?: string;
  className?: string;
};

/** A figure input: the number keypad on phones, the unit beside it, "not a number" said under it. */
export function NumberInput({ label, value, onChange, unit, hint, problem, className }: NumberInputProps) {
  const invalid = readNumber(value) === 'invalid';
  return (
    <TextField
      label={label}
      inputMode="decimal"
      autoComplete="off"
      enterKeyHint="done"
      suffix={unit}
      hint={hint}
      error={invalid ? 'Enter a number, such as 720 or 12.5' : problem}
      value={value}
      onChange={(e) => onChange(e.target.value)}
      className={className}
    />
  );
}

type ReadoutProps = {
  label: string;
  /** The figure in the user's unit. */
  value: string;
  /** The same figure in the other unit, in small type. */
  other?: string;
  /** Temperatures read in the hot accent, as on the bench screens. */
  tone?: 'heat' | 'plain';
  /** A line under the figure: what it means, or what it came from. */
  note?: ReactNode;
  size?: 'large' | 'small';
};

/** A computed figure, in tabular numerals, announced politely when it changes. */
export function Readout({ label, value, other, tone = 'plain', note, size = 'large' }: ReadoutProps) {
  const id = useId();
  return (
    <div className="flex flex-col gap-0.5">
      <p id={id} className="text-body font-medium text-ink">
        {label}
      </p>
      <output
        aria-labelledby={id}
        className={cn(
          'figures font-semibold',
          size === 'large' ? 'text-display' : 'text-title',
          tone === 'heat' ? 'text-heat' : 'text-ink',
        )}
      >
        {value}
      </output>
      {other ? <p className="figures text-caption text-ink-muted">{other}</p> : null}
      {note ? <div className="text-body text-ink-muted">{note}</div> : null}
    </div>
  );
}

/** What the results area says until the inputs give a figure. */
export function WaitingForInput({ children }: { children: ReactNode }) {
  return <p className="text-body text-ink-muted">{children}</p>;
}

/** An input the trade core cannot compute with, in words. */
export function InputProblem({ children }: { children: ReactNode }) {
  return (
    <Notice tone="caution" role="status" title="Check the inputs">
      <p>{children}</p>
    </Notice>
  );
}
