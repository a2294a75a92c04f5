import { Calculator, Library } from 'lucide-react';
import { useDeferredValue, useMemo, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { DEFECT_GROUPS, type DefectKind } from '#shared/domain/index.ts';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { buildGuideIndex, searchGuide } from '../lib/guide-search.ts';
import { GroupMark, groupInWords } from './group-mark.tsx';

const INDEX = buildGuideIndex();

/**
 * The defect guide's front page: a forgiving search ("bubbles", "divot")
 * and, with nothing typed, every defect under its group with the group's
 * letter and label shape. Enter opens the best match.
 */
export function GuideIndex({ workshopId }: { workshopId: string }) {
  const [query, setQuery] = useState('');
  const deferred = useDeferredValue(query);
  const navigate = useNavigate();
  const results = useMemo(() => searchGuide(INDEX, deferred), [deferred]);
  const searching = deferred.trim() !== '';

  return (
    <div className="flex flex-col gap-6">
      <form
        role="search"
        aria-label="Defect guide"
        onSubmit={(e) => {
          e.preventDefault();
          const best = searchGuide(INDEX, query)[0];
          if (best) navigate(paths.guideKind.getHref(workshopId, best.id));
        }}
      >
        <TextField
          label="Search the defect guide"
          type="search"
          autoComplete="off"
          enterKeyHint="go"
          hint="Say what you see: bubbles, a divot, a seam, a crack, rough skin. Enter opens the best match."
          value={query}
          onChange={(e) => setQuery(e.target.value)}
        />
      </form>

      {searching ? (
        <section aria-labelledby="guide-results" className="flex flex-col gap-3">
          <h2 id="guide-results" className="text-title font-semibold text-ink" aria-live="polite">
            {results.length === 0
              ? `Nothing matches “${deferred.trim()}”`
              : `${results.length} ${results.length === 1 ? 'defect matches' : 'defects match'} “${deferred.trim()}”, best first`}
          </h2>
          {results.length === 0 ? (
            <Notice tone="info" title="Try another word">
              <p>Describe the shape or the feel: holes, bubbles, dent, seam, crack, lump, rough, bent. Or clear the search to see every defect by group.</p>
            </Notice>
          ) : (
            <KindList workshopId={workshopId} kinds={results} showGroup />
          )}
        </section>
      ) : (
        DEFECT_GROUPS.map((group) => {
          const kinds = results.filter((k) => k.group === group.id);
          return (
            <section key={group.id} aria-labelledby={`group-${group.id}`} className="flex flex-col gap-3">
              <h2 id={`group-${group.id}`} className="flex items-center gap-2 text-title font-semibold text-ink">
                <GroupMark group={group.id} />
                {group.name}
                <span className="text-caption font-normal text-ink-muted">
                  letter {group.code}, {group.shape}
                </span>
              </h2>
              <KindList workshopId={workshopId} kinds={kinds} />
            </section>
          );
        })
      )}

      <section aria-labelledby="guide-more" className="flex flex-col gap-2 rounded-lg border border-line bg-surface-raised p-4">
        <h2 id="guide-more" className="text-body font-semibold text-ink">
          Also for the workshop
        </h2>
        <ul className="flex flex-wrap gap-x-6 gap-y-2">
          <li className="inline-flex items-center gap-2">
            <Library aria-hidden className="size-4 text-ink-muted" />
            <span>
              <TextLink to={paths.alloys.getHref(workshopId)}>Alloy library</TextLink>: freezing points and pouring ranges, with sources
            </span>
          </li>
          <li className="inline-flex items-center gap-2">
            <Calculator aria-hidden className="size-4 text-ink-muted" />
            <span>
              <TextLink to={paths.calculators.getHref(workshopId)}>Calculators</TextLink>: superheat, charge, risers, dew point
            </span>
          </li>
        </ul>
      </section>
    </div>
  );
}

function KindList({ workshopId, kinds, showGroup = false }: { workshopId: string; kinds: readonly DefectKind[]; showGroup?: boolean }) {
  return (
    <ul className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
      {kinds.map((kind) => (
        <li key={kind.id}>
          <Link
            to={paths.guideKind.getHref(workshopId, kind.id)}
            className="flex min-h-12 items-start gap-3 rounded-md border border-line bg-surface-raised p-3 text-ink no-underline hover:bg-surface-sunken"
          >
            <GroupMark group={kind.group} className="mt-0.5" />
            <span className="flex min-w-0 flex-col gap-0.5">
              <span className="font-semibold text-link underline">{kind.name}</span>
              {showGroup ? <span className="text-caption text-ink-muted">{groupInWords(kind.group)}</span> : null}
              <span className="line-clamp-2 text-caption text-ink-muted">{kind.recognise}</span>
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
