import { Filter, X } from 'lucide-react';
import { useId, useState } from 'react';
import { ALLOYS } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { FILTER_KEYS, type FilterKey, type HeatListFilter } from '../lib/heat-filters.ts';

export type FilterChoices = {
  casters: readonly { userId: string; displayName: string }[];
  furnaces: readonly { id: string; name: string }[];
  crucibles: readonly { id: string; name: string }[];
};

type HeatFilterBarProps = {
  filter: HeatListFilter;
  choices: FilterChoices;
  onChange: (filter: HeatListFilter) => void;
};

/**
 * The heat log's filters. Each change applies at once and lands in the URL,
 * so a filtered view can be bookmarked or sent. On a phone they fold away
 * behind one button; on a desk they stay open.
 */
export function HeatFilterBar({ filter, choices, onChange }: HeatFilterBarProps) {
  const panelId = useId();
  const active = FILTER_KEYS.filter((key) => filter[key]).length;
  const [open, setOpen] = useState(active > 0);
  const set = (key: FilterKey, value: string) => onChange({ ...filter, [key]: value || undefined });
  const clear = () => onChange({ sort: filter.sort, dir: filter.dir });

  return (
    <section aria-label="Filters" className="flex flex-col gap-3">
      <Button
        className="self-start lg:hidden"
        aria-expanded={open}
        aria-controls={panelId}
        icon={<Filter aria-hidden className="size-4" />}
        onClick={() => setOpen((o) => !o)}
      >
        Filters{active > 0 ? ` (${active} on)` : ''}
      </Button>
      <div id={panelId} className={`${open ? 'grid' : 'hidden'} gap-3 sm:grid-cols-2 lg:grid lg:grid-cols-6 lg:items-end`}>
        <SelectField label="Alloy" value={filter.alloy ?? ''} onChange={(e) => set('alloy', e.target.value)}>
          <option value="">Any alloy</option>
          {ALLOYS.map((a) => (
            <option key={a.designation} value={a.designation}>
              {a.designation}
            </option>
          ))}
        </SelectField>
        <SelectField label="Caster" value={filter.casterId ?? ''} onChange={(e) => set('casterId', e.target.value)}>
          <option value="">Anyone</option>
          {choices.casters.map((c) => (
            <option key={c.userId} value={c.userId}>
              {c.displayName}
            </option>
          ))}
        </SelectField>
        <SelectField label="Furnace" value={filter.furnaceId ?? ''} onChange={(e) => set('furnaceId', e.target.value)}>
          <option value="">Any furnace</option>
          {choices.furnaces.map((f) => (
            <option key={f.id} value={f.id}>
              {f.name}
            </option>
          ))}
        </SelectField>
        <SelectField label="Crucible" value={filter.crucibleId ?? ''} onChange={(e) => set('crucibleId', e.target.value)}>
          <option value="">Any crucible</option>
          {choices.crucibles.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </SelectField>
        <TextField label="Poured from" type="date" value={filter.from ?? ''} max={filter.to} onChange={(e) => set('from', e.target.value)} />
        <TextField label="Poured to" type="date" value={filter.to ?? ''} min={filter.from} onChange={(e) => set('to', e.target.value)} />
      </div>
      {active > 0 ? (
        <Button size="sm" variant="quiet" className="self-start" icon={<X aria-hidden className="size-4" />} onClick={clear}>
          Clear {active === 1 ? 'the filter' : `all ${active} filters`}
        </Button>
      ) : null}
    </section>
  );
}
