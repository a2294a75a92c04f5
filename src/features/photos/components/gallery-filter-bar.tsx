import { Search, SlidersHorizontal, X } from 'lucide-react';
import { useId, useState } from 'react';
import { ALLOYS, DEFECT_GROUPS, DEFECT_KINDS, MOLD_MATERIALS, MOLD_MATERIAL_LABELS } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { controlClasses } from '#src/components/ui/field-parts.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { cn } from '#src/lib/cn.ts';
import { FILTER_KEYS, hasFilters, SEARCH_MAX_LENGTH, type GalleryView } from '../lib/gallery-filters.ts';

export type CasterOption = { id: string; name: string };

type GalleryFilterBarProps = {
  view: GalleryView;
  onChange: (change: Partial<GalleryView>, options?: { replace?: boolean }) => void;
  onClear: () => void;
  casters: readonly CasterOption[];
  /** Alloys seen in the workshop's photos, shown first. */
  seenAlloys?: readonly string[];
  /** The search box was focused: time to fetch the index. */
  onSearchFocus?: () => void;
};

const value = (v: string) => (v === '' ? undefined : v);

/** Search and filters for the gallery; every choice goes into the URL at once. */
export function GalleryFilterBar({ view, onChange, onClear, casters, seenAlloys = [], onSearchFocus }: GalleryFilterBarProps) {
  const searchId = useId();
  const filtersId = useId();
  const activeCount = FILTER_KEYS.filter((key) => view[key] !== undefined).length;
  const [filtersOpen, setFiltersOpen] = useState(activeCount > 0);
  const alloys = [...new Set([...seenAlloys, ...ALLOYS.map((a) => a.designation), ...(view.alloy ? [view.alloy] : [])])];
  const dateProblem = view.from && view.to && view.from > view.to ? 'The “from” day is after the “to” day.' : undefined;

  return (
    <div role="search" aria-label="Search and filter the photos" className="flex flex-col gap-4 rounded-lg border border-line bg-surface-raised p-3 lg:p-4">
      <div className="flex flex-col gap-1.5">
        <label htmlFor={searchId} className="text-body font-medium text-ink">
          Search the photos
        </label>
        <div className="relative">
          <Search aria-hidden className="pointer-events-none absolute top-1/2 left-3 size-5 -translate-y-1/2 text-ink-muted" />
          <input
            id={searchId}
            type="search"
            value={view.q ?? ''}
            maxLength={SEARCH_MAX_LENGTH}
            autoComplete="off"
            spellCheck={false}
            placeholder="Title, defect, alloy, caster or notes — spelling need not be exact"
            onFocus={onSearchFocus}
            onChange={(e) => onChange({ q: value(e.target.value) }, { replace: true })}
            className={cn(controlClasses, 'pl-10')}
          />
        </div>
      </div>

      {/* On a phone the filters fold away under one button, so the photos stay near the top. */}
      <Button
        size="sm"
        className="self-start lg:hidden"
        aria-expanded={filtersOpen}
        aria-controls={filtersId}
        icon={<SlidersHorizontal aria-hidden className="size-4" />}
        onClick={() => setFiltersOpen((open) => !open)}
      >
        {filtersOpen ? 'Hide filters' : 'Filters'}
        {activeCount ? <span className="figures">({activeCount} set)</span> : null}
      </Button>
      <div id={filtersId} className={cn(filtersOpen ? 'grid' : 'hidden', 'gap-3 sm:grid-cols-2 lg:grid lg:grid-cols-3 2xl:grid-cols-6')}>
        <SelectField label="Defect" value={view.kind ?? ''} onChange={(e) => onChange({ kind: value(e.target.value) as GalleryView['kind'] })}>
          <option value="">Any defect</option>
          {DEFECT_GROUPS.map((g) => (
            <optgroup key={g.id} label={`${g.code} · ${g.name}`}>
              {DEFECT_KINDS.filter((k) => k.group === g.id).map((k) => (
                <option key={k.id} value={k.id}>
                  {k.name}
                </option>
              ))}
            </optgroup>
          ))}
        </SelectField>
        <SelectField label="Alloy" value={view.alloy ?? ''} onChange={(e) => onChange({ alloy: value(e.target.value) })}>
          <option value="">Any alloy</option>
          {alloys.map((a) => (
            <option key={a} value={a}>
              {a}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Mould"
          value={view.mouldMaterial ?? ''}
          onChange={(e) => onChange({ mouldMaterial: value(e.target.value) as GalleryView['mouldMaterial'] })}
        >
          <option value="">Any mould</option>
          {MOLD_MATERIALS.map((m) => (
            <option key={m} value={m}>
              {MOLD_MATERIAL_LABELS[m]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Caster" value={view.casterId ?? ''} onChange={(e) => onChange({ casterId: value(e.target.value) })}>
          <option value="">Anyone</option>
          {casters.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </SelectField>
        <TextField label="Added from" type="date" value={view.from ?? ''} max={view.to} onChange={(e) => onChange({ from: value(e.target.value) })} />
        <TextField
          label="Added until"
          type="date"
          value={view.to ?? ''}
          min={view.from}
          error={dateProblem}
          onChange={(e) => onChange({ to: value(e.target.value) })}
        />
      </div>
      {hasFilters(view) || view.q ? (
        <Button size="sm" variant="quiet" className="self-start" icon={<X aria-hidden className="size-4" />} onClick={onClear}>
          Clear search and filters
        </Button>
      ) : null}
    </div>
  );
}
