import type { MassUnit, TemperatureUnit } from '#shared/domain/index.ts';
import { MOLD_MATERIAL_LABELS, formatMass, formatNumber, formatTemperature } from '#shared/domain/index.ts';
import { formatDateTime } from '#src/lib/format.ts';
import type { CastingPageCasting, CastingPageHeat } from '../api/casting-queries.ts';

type CastingSummaryProps = {
  heat: CastingPageHeat;
  casting: CastingPageCasting;
  massUnit: MassUnit;
  temperatureUnit: TemperatureUnit;
};

const yesNo = (v: boolean | null) => (v === null ? null : v ? 'yes' : 'no');

/** What the casting is: its heat, mould and the figures logged for it, in the user's units. */
export function CastingSummary({ heat, casting, massUnit, temperatureUnit }: CastingSummaryProps) {
  const rows: { term: string; value: string | null; figure?: boolean }[] = [
    { term: 'Alloy', value: heat.alloy },
    { term: 'Poured', value: formatDateTime(heat.pouredAt) },
    { term: 'Caster', value: heat.casterName },
    { term: 'Pour temperature', value: heat.pourTempC === null ? null : formatTemperature(heat.pourTempC, temperatureUnit), figure: true },
    {
      term: 'Mould',
      value: casting.mould ? `${casting.mould.name} (${MOLD_MATERIAL_LABELS[casting.mould.material]}${casting.mould.hasRiser ? ', with riser' : ''})` : null,
    },
    { term: 'Mass', value: casting.massG === null ? 'not weighed yet' : formatMass(casting.massG, massUnit), figure: casting.massG !== null },
    { term: 'Share of the charge', value: casting.yieldPct === null ? null : `${formatNumber(casting.yieldPct, 0)} %`, figure: true },
    { term: 'Mould preheat', value: casting.mouldPreheatC === null ? null : formatTemperature(casting.mouldPreheatC, temperatureUnit), figure: true },
    { term: 'Section thickness', value: casting.sectionThicknessMm === null ? null : `${formatNumber(casting.sectionThicknessMm, 1)} mm`, figure: true },
    { term: 'Pour height', value: casting.pourHeightCm === null ? null : `${formatNumber(casting.pourHeightCm, 1)} cm`, figure: true },
    { term: 'Mould coated', value: yesNo(casting.coated) },
    { term: 'Mould vented', value: yesNo(casting.vented) },
    {
      term: 'Quench',
      value:
        casting.quenchMedium === 'none'
          ? null
          : `${casting.quenchMedium}${casting.airCoolMin === null ? '' : ` after ${formatNumber(casting.airCoolMin, 0)} min in air`}`,
    },
  ];
  return (
    <section aria-labelledby="casting-summary-heading" className="flex flex-col gap-3">
      <h2 id="casting-summary-heading" className="text-title font-semibold text-ink">
        The casting
      </h2>
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-2 lg:grid-cols-3 xl:grid-cols-2">
        {rows
          .filter((r) => r.value !== null)
          .map((r) => (
            <div key={r.term} className="flex flex-col border-b border-line pb-2">
              <dt className="text-caption text-ink-muted">{r.term}</dt>
              <dd className={r.figure ? 'figures text-body text-ink' : 'text-body text-ink'}>{r.value}</dd>
            </div>
          ))}
      </dl>
      {casting.notes ? <p className="max-w-prose text-body whitespace-pre-line text-ink">{casting.notes}</p> : null}
    </section>
  );
}
