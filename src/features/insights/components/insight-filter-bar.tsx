import { ALLOYS, DEFECT_GROUPS, DEFECT_KINDS } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import type { InsightView } from '../lib/insight-filters.ts';

type Props = {
  view: InsightView;
  onChange: (view: InsightView) => void;
  /** People whose heats the reader may see; the caster filter shows only with more than one. */
  casters: readonly { id: string; name: string }[];
};

/** Date range, caster, alloy and defect kind; every change goes into the URL. */
export function InsightFilterBar({ view, onChange, casters }: Props) {
  const set = (patch: Partial<InsightView>) => onChange({ ...view, ...patch });
  const anyFilter = Object.values(view).some(Boolean);
  return (
    <form role="search" aria-label="Filter the insights" className="mb-6 grid gap-3 sm:grid-cols-2 lg:grid-cols-[repeat(5,minmax(0,1fr))_auto] lg:items-end" onSubmit={(e) => e.preventDefault()}>
      <TextField label="Poured from" type="date" value={view.from ?? ''} max={view.to} onChange={(e) => set({ from: e.target.value || undefined })} />
      <TextField label="Poured to" type="date" value={view.to ?? ''} min={view.from} onChange={(e) => set({ to: e.target.value || undefined })} />
      {casters.length > 1 ? (
        <SelectField label="Caster" value={view.casterId ?? ''} onChange={(e) => set({ casterId: e.target.value || undefined })}>
          <option value="">Everyone you can see</option>
          {casters.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </SelectField>
      ) : null}
      <SelectField label="Alloy" value={view.alloy ?? ''} onChange={(e) => set({ alloy: e.target.value || undefined })}>
        <option value="">Any alloy</option>
        {ALLOYS.map((a) => (
          <option key={a.designation} value={a.designation}>
            {a.designation}
          </option>
        ))}
      </SelectField>
      <SelectField label="Defect kind" value={view.kind ?? ''} onChange={(e) => set({ kind: (e.target.value || undefined) as InsightView['kind'] })}>
        <option value="">Every group</option>
        {DEFECT_GROUPS.map((g) => (
          <optgroup key={g.id} label={g.name}>
            {DEFECT_KINDS.filter((k) => k.group === g.id).map((k) => (
              <option key={k.id} value={k.id}>
                {k.name}
              </option>
            ))}
          </optgroup>
        ))}
      </SelectField>
      <Button type="button" variant="quiet" disabled={!anyFilter} onClick={() => onChange({})}>
        Clear filters
      </Button>
    </form>
  );
}
