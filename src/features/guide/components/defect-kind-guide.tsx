import { ArrowLeft } from 'lucide-react';
import { Link } from 'react-router-dom';
import {
  CIATF_GROUPS,
  CIATF_GROUPS_SOURCE,
  DEFECT_KINDS,
  defectGroup,
  type DefectKind,
  type SourceNote,
  type TemperatureUnit,
} from '#shared/domain/index.ts';
import { paths } from '#src/config/paths.ts';
import { causesOf } from '../lib/causes-of.ts';
import { describeCondition } from '../lib/describe-condition.ts';
import { GasOrShrinkage } from './gas-or-shrinkage.tsx';
import { GroupMark, groupInWords } from './group-mark.tsx';
import { KindPhotos } from './kind-photos.tsx';

const GRADE_WORDS: Record<SourceNote['grade'], string> = {
  primary: 'read in the source',
  secondary: 'secondary source',
  memory: 'from memory',
  practice: 'common practice',
  heuristic: 'app heuristic',
};

type DefectKindGuideProps = { workshopId: string; kind: DefectKind; temperatureUnit: TemperatureUnit };

/**
 * One defect's page: how to recognise it, where it shows, the causes the
 * rule set knows grouped by melt variable with the fix to try and the source
 * of each, the workshop's own photos of it, and the sources of the text.
 */
export function DefectKindGuide({ workshopId, kind, temperatureUnit }: DefectKindGuideProps) {
  const group = defectGroup(kind.group);
  const causes = causesOf(kind.id);
  const siblings = DEFECT_KINDS.filter((k) => k.group === kind.group && k.id !== kind.id);

  return (
    <article className="flex flex-col gap-8" aria-labelledby="kind-title">
      <header className="flex flex-col gap-3">
        <Link to={paths.guide.getHref(workshopId)} className="inline-flex min-h-12 items-center gap-1 self-start font-medium text-link underline lg:min-h-0">
          <ArrowLeft aria-hidden className="size-4" />
          Defect guide
        </Link>
        <h1 id="kind-title" className="text-heading font-semibold text-ink">
          {kind.name}
        </h1>
        <p className="flex flex-wrap items-center gap-2 text-body text-ink">
          <GroupMark group={kind.group} />
          <span>{groupInWords(kind.group)}</span>
          <span className="text-ink-muted">· label on a mark: “{kind.shortName}”</span>
          {kind.ciatfGroup ? (
            <span className="text-ink-muted">
              · casting-defect atlas group {kind.ciatfGroup}, {CIATF_GROUPS[kind.ciatfGroup].toLowerCase()}
            </span>
          ) : null}
        </p>
      </header>

      <div className="grid gap-6 lg:grid-cols-2">
        <section aria-labelledby="kind-recognise" className="flex flex-col gap-2">
          <h2 id="kind-recognise" className="text-title font-semibold text-ink">
            How to recognise it
          </h2>
          <p className="max-w-prose text-lead text-ink">{kind.recognise}</p>
        </section>
        <section aria-labelledby="kind-where" className="flex flex-col gap-2">
          <h2 id="kind-where" className="text-title font-semibold text-ink">
            Where it shows
          </h2>
          <p className="max-w-prose text-lead text-ink">{kind.where}</p>
          <p className="text-body text-ink-muted">Also called: {kind.synonyms.join(', ')}.</p>
        </section>
      </div>

      {kind.group === 'gas' || kind.group === 'shrinkage' ? <GasOrShrinkage workshopId={workshopId} current={kind.group} /> : null}

      <section aria-labelledby="kind-causes" className="flex flex-col gap-4">
        <div className="flex flex-col gap-1">
          <h2 id="kind-causes" className="text-title font-semibold text-ink">
            Likely causes, by melt variable
          </h2>
          <p className="max-w-prose text-body text-ink-muted">
            What the diagnosis looks for in a heat's record, strongest first, with the fix to try. A heat that shows none of these points
            elsewhere; its report will say which values were missing.
          </p>
        </div>
        {causes.length === 0 ? (
          <p className="text-body text-ink">The rule set has no causes for this defect yet; a mentor's review is the way to find one.</p>
        ) : (
          <ol className="flex flex-col gap-4">
            {causes.map(({ variable, rules }) => (
              <li key={variable.id} className="rounded-lg border border-line bg-surface-raised p-4">
                <h3 className="text-title font-semibold text-ink">{variable.name}</h3>
                <p className="mt-1 max-w-prose text-body text-ink-muted">{variable.explanation}</p>
                <ul className="mt-3 flex flex-col gap-3">
                  {rules.map((rule) => (
                    <li key={rule.id} className="flex flex-col gap-1 border-l-2 border-line-strong pl-3">
                      <p className="text-body text-ink">
                        <span className="font-semibold">Points to it: </span>
                        {describeCondition(rule.when, temperatureUnit)}
                        {rule.appliesWhen ? (
                          <span className="text-ink-muted"> (when {describeCondition(rule.appliesWhen, temperatureUnit)})</span>
                        ) : null}
                      </p>
                      <div className="text-body text-ink">
                        <span className="font-semibold">{rule.fixes.length === 1 ? 'Fix to try: ' : 'Fixes to try:'}</span>
                        {rule.fixes.length === 1 ? (
                          rule.fixes[0]
                        ) : (
                          <ul className="ml-5 list-disc">
                            {rule.fixes.map((fix) => (
                              <li key={fix}>{fix}</li>
                            ))}
                          </ul>
                        )}
                      </div>
                      <p className="text-caption text-ink-muted">Source: {rule.source}</p>
                    </li>
                  ))}
                </ul>
              </li>
            ))}
          </ol>
        )}
      </section>

      <KindPhotos workshopId={workshopId} kind={kind} />

      {siblings.length > 0 ? (
        <section aria-labelledby="kind-siblings" className="flex flex-col gap-2">
          <h2 id="kind-siblings" className="text-title font-semibold text-ink">
            Also in the {group.name.toLowerCase()} group
          </h2>
          <ul className="flex flex-wrap gap-x-5 gap-y-2">
            {siblings.map((k) => (
              <li key={k.id}>
                <Link to={paths.guideKind.getHref(workshopId, k.id)} className="inline-flex min-h-12 items-center font-medium text-link underline lg:min-h-0">
                  {k.name}
                </Link>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <section aria-labelledby="kind-sources" className="flex flex-col gap-2">
        <h2 id="kind-sources" className="text-title font-semibold text-ink">
          Sources
        </h2>
        <ul className="flex max-w-prose list-disc flex-col gap-1 pl-5 text-body text-ink">
          <li>
            Description: {kind.source.citation} <span className="text-caption text-ink-muted">[{GRADE_WORDS[kind.source.grade]}]</span>
          </li>
          {kind.ciatfGroup ? (
            <li>
              Atlas group letters: {CIATF_GROUPS_SOURCE.citation}{' '}
              <span className="text-caption text-ink-muted">[{GRADE_WORDS[CIATF_GROUPS_SOURCE.grade]}]</span>
            </li>
          ) : null}
          <li>Causes and fixes: each carries its own source above. Their order comes from the rule set's weights, which are this app's heuristic.</li>
        </ul>
      </section>
    </article>
  );
}
