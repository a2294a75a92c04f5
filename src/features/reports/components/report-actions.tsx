import { useState, type FormEvent } from 'react';
import { MELT_VARIABLES } from '#shared/domain/index.ts';
import type { MeltVariableId } from '#shared/domain/index.ts';
import type { ReportAction } from '#shared/reports/report-states.ts';
import type { ReportTransitionInput } from '#shared/reports/report-schemas.ts';
import { reportTransitionSchema } from '#shared/reports/report-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { CheckboxField } from '#src/components/ui/checkbox-field.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextareaField } from '#src/components/ui/textarea-field.tsx';

export const ACTION_LABELS: Record<ReportAction, string> = {
  submit: 'Submit to a mentor',
  withdraw: 'Withdraw to edit',
  start_review: 'Start the review',
  resolve: 'Resolve with confirmed causes',
  reopen: 'Reopen',
};

type ReportActionsProps = {
  allowedActions: readonly ReportAction[];
  /** The ranked variables, offered first in the confirm-causes form. */
  rankedVariables?: readonly MeltVariableId[];
  onTransition: (input: ReportTransitionInput) => Promise<unknown>;
  pending?: boolean;
};

/** The moves the viewer may make now, straight from the server's `allowedActions`; nothing else shows. */
export function ReportActions({ allowedActions, rankedVariables = [], onTransition, pending }: ReportActionsProps) {
  const [open, setOpen] = useState<'resolve' | 'reopen' | null>(null);
  const [error, setError] = useState<string | null>(null);
  if (allowedActions.length === 0) return null;

  const run = async (input: ReportTransitionInput) => {
    setError(null);
    try {
      await onTransition(input);
      setOpen(null);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'That did not work');
    }
  };

  return (
    <section aria-label="What you can do" className="flex flex-col gap-3" data-testid="report-actions">
      <div className="flex flex-wrap gap-2">
        {allowedActions.map((action) =>
          action === 'resolve' || action === 'reopen' ? (
            <Button key={action} variant={action === 'resolve' ? 'primary' : 'secondary'} aria-expanded={open === action} onClick={() => setOpen(open === action ? null : action)}>
              {ACTION_LABELS[action]}
            </Button>
          ) : (
            <Button key={action} variant={action === 'withdraw' ? 'secondary' : 'primary'} pending={pending} onClick={() => void run({ action } as ReportTransitionInput)}>
              {ACTION_LABELS[action]}
            </Button>
          ),
        )}
      </div>
      {error ? (
        <Notice tone="danger" role="alert" title="Not done">
          <p>{error}</p>
        </Notice>
      ) : null}
      {open === 'resolve' ? <ConfirmCausesForm rankedVariables={rankedVariables} pending={pending} onSubmit={run} /> : null}
      {open === 'reopen' ? <ReopenForm pending={pending} onSubmit={run} /> : null}
    </section>
  );
}

type CauseDraft = { note: string; fixes: string };

function ConfirmCausesForm({ rankedVariables, pending, onSubmit }: { rankedVariables: readonly MeltVariableId[]; pending?: boolean; onSubmit: (input: ReportTransitionInput) => Promise<void> }) {
  const ordered = [...rankedVariables, ...MELT_VARIABLES.map((v) => v.id).filter((id) => !rankedVariables.includes(id))];
  const [picked, setPicked] = useState<MeltVariableId[]>([]);
  const [drafts, setDrafts] = useState<Partial<Record<MeltVariableId, CauseDraft>>>({});
  const [note, setNote] = useState('');
  const [issues, setIssues] = useState<string[]>([]);

  const toggle = (id: MeltVariableId) => setPicked((p) => (p.includes(id) ? p.filter((x) => x !== id) : p.length >= 5 ? p : [...p, id]));
  const setDraft = (id: MeltVariableId, key: keyof CauseDraft, value: string) =>
    setDrafts((d) => ({ ...d, [id]: { note: '', fixes: '', ...d[id], [key]: value } }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const input = {
      action: 'resolve' as const,
      note,
      causes: picked.map((variable) => ({
        variable,
        note: drafts[variable]?.note ?? '',
        fixesToTry: (drafts[variable]?.fixes ?? '').split('\n').map((s) => s.trim()).filter(Boolean),
      })),
    };
    const parsed = reportTransitionSchema.safeParse(input);
    if (!parsed.success) return setIssues(parsed.error.issues.map((i) => i.message));
    setIssues([]);
    void onSubmit(parsed.data);
  };

  const name = (id: MeltVariableId) => MELT_VARIABLES.find((v) => v.id === id)?.name ?? id;
  return (
    <form onSubmit={submit} aria-label="Confirm causes" className="flex flex-col gap-3 rounded-md border border-line bg-surface-sunken p-3">
      <fieldset className="flex flex-col gap-1">
        <legend className="font-semibold text-ink">Confirmed causes (1 to 5)</legend>
        <p className="text-caption text-ink-muted">The ranked causes come first. {picked.length} of 5 picked.</p>
        <div className="grid gap-1 sm:grid-cols-2">
          {ordered.map((id) => (
            <CheckboxField key={id} label={name(id)} checked={picked.includes(id)} disabled={!picked.includes(id) && picked.length >= 5} onChange={() => toggle(id)} />
          ))}
        </div>
      </fieldset>
      {picked.map((id) => (
        <fieldset key={id} className="flex flex-col gap-2 border-l-4 border-line-strong pl-3">
          <legend className="font-semibold text-ink">{name(id)}</legend>
          <TextareaField label={`Why ${name(id).toLowerCase()}`} rows={2} value={drafts[id]?.note ?? ''} onChange={(e) => setDraft(id, 'note', e.target.value)} />
          <TextareaField
            label="Fixes to try"
            hint="One a line."
            rows={2}
            value={drafts[id]?.fixes ?? ''}
            onChange={(e) => setDraft(id, 'fixes', e.target.value)}
          />
        </fieldset>
      ))}
      <TextareaField label="What you concluded" hint="The author reads this first." rows={3} value={note} onChange={(e) => setNote(e.target.value)} />
      {issues.length > 0 ? (
        <Notice tone="danger" role="alert" title="Not yet">
          <ul>
            {[...new Set(issues)].map((i) => (
              <li key={i}>{i}</li>
            ))}
          </ul>
        </Notice>
      ) : null}
      <Button type="submit" variant="primary" pending={pending} pendingLabel="Resolving…" className="self-start">
        Resolve the report
      </Button>
    </form>
  );
}

function ReopenForm({ pending, onSubmit }: { pending?: boolean; onSubmit: (input: ReportTransitionInput) => Promise<void> }) {
  const [note, setNote] = useState('');
  const [error, setError] = useState<string>();
  return (
    <form
      aria-label="Reopen the report"
      className="flex flex-col gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        if (!note.trim()) return setError('Say why it is reopened');
        void onSubmit({ action: 'reopen', note });
      }}
    >
      <TextareaField label="Why reopen it" rows={2} value={note} onChange={(e) => setNote(e.target.value)} error={error} />
      <Button type="submit" pending={pending} className="self-start">
        Reopen the report
      </Button>
    </form>
  );
}
