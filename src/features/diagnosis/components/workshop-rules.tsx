import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { DEFAULT_RULES, findDefectKind, findMeltVariable, ruleSchema } from '#shared/domain/index.ts';
import type { RulePreview, WorkshopRule } from '#shared/reports/workshop-rule-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { CheckboxField } from '#src/components/ui/checkbox-field.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextareaField } from '#src/components/ui/textarea-field.tsx';
import { diagnosisQueries } from '../api/diagnosis-queries.ts';
import { useCreateRule, useDeleteRule, usePreviewRule, useUpdateRule } from '../api/rule-mutations.ts';

const EXAMPLE = JSON.stringify({ ...DEFAULT_RULES[0], id: 'our-own-rule' }, null, 2);

/** The workshop's rule set: shipped rules to switch or weigh, its own rules, and a preview against past reviews. */
export function WorkshopRules({ workshopId, canEdit }: { workshopId: string; canEdit: boolean }) {
  const { data } = useSuspenseQuery(diagnosisQueries.rules(workshopId));
  const preview = usePreviewRule(workshopId);
  const [previewFor, setPreviewFor] = useState<string | null>(null);
  const showPreview = (label: string, run: () => Promise<RulePreview>) => {
    setPreviewFor(label);
    void run().catch(() => undefined);
  };
  return (
    <div className="flex flex-col gap-6">
      <p className="text-body text-ink-muted">
        {data.rules.filter((r) => r.enabled).length} of {data.rules.length} rules on{data.ruleSet.custom ? ', with this workshop’s changes' : ', as shipped'}.
      </p>
      {canEdit ? <AddRule workshopId={workshopId} onPreview={(rule) => showPreview(`the new rule ${rule.id}`, () => preview.mutateAsync({ rule }))} /> : null}
      {previewFor ? (
        <section aria-live="polite" aria-label="Preview" className="flex flex-col gap-2 rounded-md border-2 border-dashed border-line-strong p-3">
          <h2 className="text-title font-semibold text-ink">Preview: {previewFor} (not saved)</h2>
          {preview.isPending ? <p>Replaying past reports…</p> : null}
          {preview.error ? <p className="text-danger">{preview.error.message}</p> : null}
          {preview.data ? <PreviewTable preview={preview.data} /> : null}
        </section>
      ) : null}
      <ul className="flex flex-col gap-2">
        {data.rules.map((r) => (
          <RuleRow
            key={r.rule.id}
            workshopId={workshopId}
            entry={r}
            canEdit={canEdit}
            onPreview={(override) => showPreview(`${r.rule.id} changed`, () => preview.mutateAsync({ override: { ruleId: r.rule.id, ...override } }))}
          />
        ))}
      </ul>
    </div>
  );
}

function RuleRow({
  workshopId,
  entry,
  canEdit,
  onPreview,
}: {
  workshopId: string;
  entry: WorkshopRule;
  canEdit: boolean;
  onPreview: (override: { enabled?: boolean; weight?: number }) => void;
}) {
  const update = useUpdateRule(workshopId);
  const remove = useDeleteRule(workshopId);
  const [weight, setWeight] = useState(entry.rule.weight);
  const { rule } = entry;
  return (
    <li className="flex flex-col gap-2 rounded-md border border-line bg-surface-raised p-3">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="font-mono text-body font-semibold text-ink">{rule.id}</p>
        <p className="text-caption text-ink-muted">
          {entry.origin === 'default' ? (entry.overridden ? 'shipped, changed here' : 'shipped') : 'this workshop’s own'} · {entry.enabled ? 'on' : 'off'}
        </p>
      </div>
      <p className="text-body text-ink">
        {findMeltVariable(rule.variable)?.name ?? rule.variable}, for {rule.defects.map((d) => findDefectKind(d)?.name.toLowerCase() ?? d).join(', ')}
      </p>
      <p className="text-caption text-ink-muted">Source: {rule.source}</p>
      {canEdit ? (
        <div className="flex flex-wrap items-end gap-4">
          <CheckboxField label="On" checked={entry.enabled} onChange={(e) => update.mutate({ ruleId: rule.id, input: { enabled: e.target.checked } })} />
          <label className="flex flex-col gap-1 text-body text-ink">
            <span>
              Weight <span className="font-mono tabular-nums">{weight.toFixed(2)}</span> of 1
              {entry.defaultWeight !== null && entry.defaultWeight !== weight ? ` (shipped ${entry.defaultWeight.toFixed(2)})` : ''}
            </span>
            <input
              type="range"
              min={0}
              max={1}
              step={0.05}
              value={weight}
              onChange={(e) => setWeight(Number(e.target.value))}
              className="min-h-12 w-56 accent-accent"
              aria-valuetext={`${weight.toFixed(2)} of 1`}
            />
          </label>
          <Button size="sm" pending={update.isPending} disabled={weight === entry.rule.weight} onClick={() => update.mutate({ ruleId: rule.id, input: { weight } })}>
            Save the weight
          </Button>
          <Button size="sm" variant="quiet" onClick={() => onPreview({ weight, enabled: entry.enabled })}>
            Preview
          </Button>
          {entry.origin === 'default' && entry.overridden ? (
            <Button size="sm" variant="quiet" onClick={() => update.mutate({ ruleId: rule.id, input: { weight: null, enabled: true } }, { onSuccess: () => setWeight(entry.defaultWeight ?? weight) })}>
              Back to shipped
            </Button>
          ) : null}
          {entry.origin === 'workshop' ? (
            <Button size="sm" variant="danger" pending={remove.isPending} onClick={() => remove.mutate(rule.id)}>
              Delete
            </Button>
          ) : null}
        </div>
      ) : null}
    </li>
  );
}

function AddRule({ workshopId, onPreview }: { workshopId: string; onPreview: (rule: import('#shared/domain/index.ts').Rule) => void }) {
  const create = useCreateRule(workshopId);
  const [text, setText] = useState('');
  const [issues, setIssues] = useState<string[]>([]);
  const parse = () => {
    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch {
      setIssues(['That is not valid JSON']);
      return null;
    }
    const parsed = ruleSchema.safeParse(json);
    if (!parsed.success) {
      setIssues(parsed.error.issues.map((i) => `${i.path.join('.') || 'rule'}: ${i.message}`));
      return null;
    }
    setIssues([]);
    return parsed.data;
  };
  return (
    <details className="rounded-md border border-line p-3">
      <summary className="min-h-12 cursor-pointer font-semibold text-ink lg:min-h-0">Add a rule</summary>
      <div className="mt-2 flex flex-col gap-2">
        <TextareaField
          label="The rule, in the trade core's JSON"
          hint="Checked against the same schema the server uses. Every rule needs its source."
          rows={14}
          className="font-mono"
          value={text}
          placeholder={EXAMPLE}
          onChange={(e) => setText(e.target.value)}
        />
        <div className="flex flex-wrap gap-2">
          <Button size="sm" onClick={() => setText(EXAMPLE)}>
            Start from an example
          </Button>
          <Button size="sm" onClick={() => { const r = parse(); if (r) onPreview(r); }}>
            Preview against past reports
          </Button>
          <Button size="sm" variant="primary" pending={create.isPending} onClick={() => { const r = parse(); if (r) create.mutate(r, { onSuccess: () => setText('') }); }}>
            Add the rule
          </Button>
        </div>
        {issues.length > 0 || create.error ? (
          <Notice tone="danger" role="alert" title="Not added">
            <ul>
              {issues.map((i) => (
                <li key={i}>{i}</li>
              ))}
              {create.error ? <li>{create.error.message}</li> : null}
            </ul>
          </Notice>
        ) : null}
      </div>
    </details>
  );
}

function PreviewTable({ preview }: { preview: RulePreview }) {
  const name = (v: string) => findMeltVariable(v)?.name ?? v;
  return (
    <>
      <p className="text-body text-ink">
        Of the last {preview.reports.length} resolved reports, {preview.summary.improved} would rank a confirmed cause higher, {preview.summary.worsened} lower and{' '}
        {preview.summary.unchanged} the same.
      </p>
      <div className="overflow-x-auto">
        <table className="min-w-full text-body">
          <thead>
            <tr className="text-left">
              <th scope="col" className="p-2">Report</th>
              <th scope="col" className="p-2">Confirmed</th>
              <th scope="col" className="p-2">Best rank before</th>
              <th scope="col" className="p-2">Best rank after</th>
              <th scope="col" className="p-2">Top causes after</th>
            </tr>
          </thead>
          <tbody>
            {preview.reports.map((r) => (
              <tr key={r.reportId} className="border-t border-line">
                <td className="p-2">{r.title}</td>
                <td className="p-2">{r.confirmedCauses.map(name).join(', ')}</td>
                <td className="p-2 font-mono tabular-nums">{r.bestConfirmedRankBefore ?? 'not ranked'}</td>
                <td className="p-2 font-mono tabular-nums">{r.bestConfirmedRankAfter ?? 'not ranked'}</td>
                <td className="p-2">{r.after.map((c) => name(c.variable)).join(', ')}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
