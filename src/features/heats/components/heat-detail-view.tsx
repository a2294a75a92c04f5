import { CircleCheck, CircleMinus, Images } from 'lucide-react';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import {
  CHARGE_KIND_LABELS,
  FLUX_KIND_LABELS,
  MOLD_MATERIAL_LABELS,
  findAlloy,
  formatMass,
  formatNumber,
  formatTemperature,
  formatTemperatureDifference,
  mouldKindOf,
  pourRangeFor,
} from '#shared/domain/index.ts';
import { CRUCIBLE_MATERIAL_LABELS } from '#shared/heats/crucible-life.ts';
import { CRUCIBLE_SHOCK_LABELS, FURNACE_KIND_LABELS } from '#shared/heats/equipment-schemas.ts';
import { DEGASSING_LABELS, SAFETY_CHECK_LABELS, SAFETY_CHECKS, type HeatDetail } from '#shared/heats/heat-schemas.ts';
import { Card } from '#src/components/ui/card.tsx';
import { Caution } from '#src/components/ui/caution.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDateTime } from '#src/lib/format.ts';
import type { Units } from '#src/lib/unit-input.ts';
import { CAUTION_LOOK } from '../lib/caution-look.ts';
import {
  HUMIDITY_RISK_WORDS,
  MOULD_KIND_WORDS,
  humidityBandsText,
  hydrogenText,
  hydrogenValue,
  percent,
  rangePositionText,
  rangeText,
  remainderText,
  superheatText,
} from '../lib/figure-text.ts';
import { QUENCH_LABELS } from './castings-field.tsx';
import { Figure, Figures } from './figure.tsx';
import { NotRecorded } from './heat-table.tsx';

const yesNo = (v: boolean | null) => (v === null ? null : v ? 'yes' : 'no');

/** Everything a logged heat records, with its figures and cautions, in the user's units. */
export function HeatDetailView({ heat, workshopId, units }: { heat: HeatDetail; workshopId: string; units: Units }) {
  const { temperatureUnit: t, massUnit: m } = units;
  const f = heat.figures;
  const alloy = findAlloy(heat.alloy);
  const firstMould = heat.castings.find((k) => k.mould)?.mould;
  const pourRange = alloy ? pourRangeFor(alloy, firstMould ? mouldKindOf(firstMould.material) : undefined) : undefined;
  const temp = (c: number | null) => (c === null ? null : formatTemperature(c, t));
  const mass = (g: number | null) => (g === null ? null : formatMass(g, m));

  return (
    <div className="flex flex-col gap-6">
      {heat.cautions.length > 0 ? (
        <section aria-labelledby="heat-cautions" className="flex flex-col gap-3">
          <h2 id="heat-cautions" className="text-title font-semibold text-ink">
            Cautions
          </h2>
          {heat.cautions.map((c) => (
            <Caution key={c.id} heading={c.title} level={CAUTION_LOOK[c.id].level} safetySection={CAUTION_LOOK[c.id].section}>
              {c.text}
            </Caution>
          ))}
        </section>
      ) : null}

      <Card title="Figures" description="Worked out from the readings below.">
        <Figures label="Figures of this heat" className="lg:grid-cols-3">
          <Figure label="Superheat" heat value={f.superheatC === null ? null : formatTemperatureDifference(f.superheatC, t)} missing="needs the pour temperature">
            {superheatText(f, heat.alloy, t)}
          </Figure>
          <Figure label="Yield" value={f.yieldPct === null ? null : percent(f.yieldPct)} missing={heat.castings.length ? 'weigh every casting to see it' : 'no castings logged'}>
            {remainderText(f, units)}
          </Figure>
          <Figure label="Hold time" value={f.holdTimeMin === null ? null : `${formatNumber(f.holdTimeMin, 0)} min`} missing="needs the melt start time" />
          <Figure label="Charged" value={formatMass(f.chargeG, m)}>
            {f.castingsG === null ? null : `castings ${formatMass(f.castingsG, m)}`}
          </Figure>
          <Figure label="Pouring range" heat value={pourRange ? rangeText(pourRange.range, t) : null} missing="not in the alloy library">
            {pourRange
              ? `${MOULD_KIND_WORDS[pourRange.mouldKind]}${heat.pourTempC === null ? '' : `; this pour was ${rangePositionText(heat.pourTempC, pourRange.range, t)}`}`
              : null}
          </Figure>
          <Figure label="Hydrogen the melt could hold at the pour" value={f.hydrogen ? hydrogenValue(f.hydrogen) : null} missing="aluminium alloys with a pour temperature">
            {f.hydrogen ? hydrogenText(f.hydrogen, t) : null}
          </Figure>
          <Figure label="Dew point" value={f.dewPointC === null ? null : formatTemperature(f.dewPointC, t)} missing="needs air temperature and humidity">
            {f.humidityRisk ? `${HUMIDITY_RISK_WORDS[f.humidityRisk]}. ${humidityBandsText(t)}` : null}
          </Figure>
          {heat.crucible && f.crucibleCycle !== null ? (
            <Figure label="Crucible heat number" value={`heat ${f.crucibleCycle}`}>
              of {heat.crucible.name}; warn at {heat.crucible.warnAt}, limit {heat.crucible.limitAt}, {heat.crucible.cycleCount} so far
            </Figure>
          ) : null}
        </Figures>
      </Card>

      <Card title="Readings">
        <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2 lg:grid-cols-3">
          <Reading term="Alloy">{alloy ? `${heat.alloy} · ${alloy.commonName}` : heat.alloy}</Reading>
          <Reading term="Caster">{heat.casterName}</Reading>
          <Reading term="Melt started">{heat.meltStartedAt ? formatDateTime(heat.meltStartedAt) : null}</Reading>
          <Reading term="Poured">{formatDateTime(heat.pouredAt)}</Reading>
          <Reading term="Furnace">
            {heat.furnace ? (
              <>
                <Link to={paths.furnace.getHref(workshopId, heat.furnace.id)} className="text-link underline">
                  {heat.furnace.name}
                </Link>{' '}
                ({FURNACE_KIND_LABELS[heat.furnace.kind]})
              </>
            ) : null}
          </Reading>
          <Reading term="Crucible">
            {heat.crucible ? (
              <>
                <Link to={paths.crucible.getHref(workshopId, heat.crucible.id)} className="text-link underline">
                  {heat.crucible.name}
                </Link>{' '}
                ({CRUCIBLE_MATERIAL_LABELS[heat.crucible.material]})
              </>
            ) : null}
          </Reading>
          <Reading term="Setpoint" heat>{temp(heat.setpointC)}</Reading>
          <Reading term="Peak melt temperature" heat>{temp(heat.peakTempC)}</Reading>
          <Reading term="Pour temperature" heat>{temp(heat.pourTempC)}</Reading>
          <Reading term="Flux">
            {heat.fluxKind === 'none' ? 'none' : `${FLUX_KIND_LABELS[heat.fluxKind]}${heat.fluxAmountG === null ? '' : `, ${formatMass(heat.fluxAmountG, m)}`}`}
          </Reading>
          <Reading term="Degassing">{DEGASSING_LABELS[heat.degassing]}</Reading>
          <Reading term="Skimmed">{yesNo(heat.skimmed)}</Reading>
          <Reading term="Tools preheated">{yesNo(heat.toolsPreheated)}</Reading>
          <Reading term="Air temperature">{temp(heat.ambientTempC)}</Reading>
          <Reading term="Relative humidity" figure>
            {heat.relativeHumidityPct === null ? null : `${formatNumber(heat.relativeHumidityPct, 0)} %`}
          </Reading>
          <Reading term="Left in the crucible" figure>
            {mass(heat.crucibleRemainderG)}
          </Reading>
          <Reading term="Crucible shock">{CRUCIBLE_SHOCK_LABELS[heat.crucibleShock]}</Reading>
        </dl>
        {heat.notes ? <p className="mt-4 max-w-prose text-body whitespace-pre-line text-ink">{heat.notes}</p> : null}
      </Card>

      <Card title="Before the pour">
        <ul className="flex flex-col gap-2">
          {SAFETY_CHECKS.map((check) => (
            <li key={check} className="flex items-center gap-2 text-body">
              {heat.safety[check] ? (
                <CircleCheck aria-hidden className="size-5 text-sound" />
              ) : (
                <CircleMinus aria-hidden className="size-5 text-caution" />
              )}
              <span>
                {SAFETY_CHECK_LABELS[check]}: <span className="font-semibold">{heat.safety[check] ? 'ticked' : 'not ticked'}</span>
              </span>
            </li>
          ))}
        </ul>
      </Card>

      <Card title="Charge lines">
        <table className="w-full border-collapse text-left text-body">
          <caption className="sr-only">What went into the crucible</caption>
          <thead>
            <tr className="border-b border-line text-caption text-ink-muted">
              <th scope="col" className="py-2 pr-4 font-medium">Kind</th>
              <th scope="col" className="py-2 pr-4 font-medium">What it was</th>
              <th scope="col" className="py-2 text-right font-medium">Mass</th>
            </tr>
          </thead>
          <tbody>
            {heat.chargeLines.map((line, i) => (
              <tr key={i} className="border-b border-line">
                <td className="py-2 pr-4">{CHARGE_KIND_LABELS[line.kind]}</td>
                <td className="py-2 pr-4">{line.description ?? <NotRecorded />}</td>
                <td className="figures py-2 text-right">{formatMass(line.massG, m)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr>
              <th scope="row" colSpan={2} className="py-2 pr-4 text-left font-semibold">
                Charged in all
              </th>
              <td className="figures py-2 text-right font-semibold">{formatMass(f.chargeG, m)}</td>
            </tr>
          </tfoot>
        </table>
      </Card>

      <section aria-labelledby="heat-castings" className="flex flex-col gap-3">
        <h2 id="heat-castings" className="text-title font-semibold text-ink">
          Castings
        </h2>
        {heat.castings.length === 0 ? (
          <p className="text-body text-ink-muted">No castings logged for this heat. Edit the heat to add the pours; photos and defects hang on a casting.</p>
        ) : (
          <ol className="grid gap-3 lg:grid-cols-2">
            {heat.castings.map((k, i) => (
              <li key={k.id}>
                <Link
                  to={paths.casting.getHref(workshopId, heat.id, k.id)}
                  className="flex min-h-12 flex-col gap-2 rounded-lg border border-line bg-surface-raised p-4 text-ink no-underline"
                >
                  <span className="flex flex-wrap items-baseline justify-between gap-2">
                    <span className="text-lead font-semibold text-link underline">Casting {i + 1}</span>
                    <span className="inline-flex items-center gap-1 text-caption text-ink-muted">
                      <Images aria-hidden className="size-4" /> photos and defects
                    </span>
                  </span>
                  <span className="text-body">{k.mould ? `${k.mould.name} (${MOLD_MATERIAL_LABELS[k.mould.material]})` : 'Mould not recorded'}</span>
                  <span className="figures flex flex-wrap gap-x-4 gap-y-1 text-body">
                    <span>{k.massG === null ? 'not weighed yet' : formatMass(k.massG, m)}</span>
                    {k.yieldPct === null ? null : <span>{percent(k.yieldPct)} of the charge</span>}
                    {k.mouldPreheatC === null ? null : <span className="text-heat">mould {formatTemperature(k.mouldPreheatC, t)}</span>}
                  </span>
                  <span className="text-caption text-ink">
                    {[
                      k.coated === null ? null : k.coated ? 'coated' : 'not coated',
                      k.vented === null ? null : k.vented ? 'vented' : 'not vented',
                      k.pourHeightCm === null ? null : `poured from ${formatNumber(k.pourHeightCm, 0)} cm`,
                      k.sectionThicknessMm === null ? null : `thickest section ${formatNumber(k.sectionThicknessMm, 0)} mm`,
                      `quench: ${QUENCH_LABELS[k.quenchMedium]}${k.airCoolMin === null ? '' : ` after ${formatNumber(k.airCoolMin, 0)} min in air`}`,
                    ]
                      .filter(Boolean)
                      .join(' · ')}
                  </span>
                </Link>
              </li>
            ))}
          </ol>
        )}
      </section>
    </div>
  );
}

function Reading({ term, children, heat, figure }: { term: string; children: ReactNode; heat?: boolean; figure?: boolean }) {
  const empty = children === null || children === undefined || children === false;
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-caption text-ink-muted">{term}</dt>
      <dd className={heat || figure ? `figures text-body ${heat ? 'text-heat' : 'text-ink'}` : 'text-body text-ink'}>{empty ? <NotRecorded /> : children}</dd>
    </div>
  );
}
