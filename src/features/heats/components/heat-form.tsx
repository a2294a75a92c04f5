import { zodResolver } from '@hookform/resolvers/zod';
import { Save } from 'lucide-react';
import { useMemo, useState, type ReactNode } from 'react';
import { FormProvider, useForm, type FieldPath } from 'react-hook-form';
import {
  ALLOY_FAMILIES,
  ALLOYS,
  FLUX_KIND_LABELS,
  formatMass,
  formatTemperature,
  formatTemperatureDifference,
} from '#shared/domain/index.ts';
import { CRUCIBLE_MATERIAL_LABELS } from '#shared/heats/crucible-life.ts';
import { CRUCIBLE_SHOCK_LABELS, CRUCIBLE_SHOCKS, FURNACE_KIND_LABELS } from '#shared/heats/equipment-schemas.ts';
import type { Crucible, Furnace, Mould } from '#shared/heats/equipment-schemas.ts';
import {
  DEGASSING_LABELS,
  DEGASSING_METHODS,
  HEAT_FLUX_KINDS,
  SAFETY_CHECK_LABELS,
  SAFETY_CHECKS,
  type HeatCreateInput,
} from '#shared/heats/heat-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Caution } from '#src/components/ui/caution.tsx';
import { CheckboxField } from '#src/components/ui/checkbox-field.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { TextareaField } from '#src/components/ui/textarea-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { massSymbol, numberToInput, parseDecimal, temperatureFromInput, temperatureSymbol, type Units } from '#src/lib/unit-input.ts';
import { useNow } from '../hooks/use-now.ts';
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
import { liveFiguresOf } from '../lib/heat-form-figures.ts';
import { formPathOf, heatFormSchema, type HeatFormValues } from '../lib/heat-form-values.ts';
import { CastingsField } from './castings-field.tsx';
import { ChargeLinesField } from './charge-lines-field.tsx';
import { Figure, Figures } from './figure.tsx';
import { HoldClock } from './hold-clock.tsx';
import { SetpointHint } from './setpoint-hint.tsx';
import { TriStateField } from './tri-state-field.tsx';
import { WeighOutHint } from './weigh-out-hint.tsx';

export type HeatFormEquipment = { furnaces: readonly Furnace[]; crucibles: readonly Crucible[]; moulds: readonly Mould[] };

export type HeatFormSaveContext = {
  values: HeatFormValues;
  /** react-hook-form's dirty flags: an edit sends only what was touched. */
  dirtyFields: Record<string, unknown>;
};

type HeatFormProps = {
  workshopId: string;
  units: Units;
  defaultValues: HeatFormValues;
  equipment: HeatFormEquipment;
  /** Members an admin may log for (with themselves when editing); left out for everyone else, who log their own. */
  casters?: readonly { userId: string; displayName: string }[];
  /** The mould a new casting starts with (the caster's last), and the weigh-out's first guess. */
  defaultMouldId: string | null;
  /** Editing: the stored heat's crucible heat number, which the live caution keeps while the crucible is unchanged. */
  storedCrucibleCycle?: { crucibleId: string; cycle: number | null };
  /** A line above the form, e.g. which heat the defaults came from. */
  intro?: ReactNode;
  submitLabel: string;
  pendingLabel: string;
  /** Sends the checked heat; a rejection's field issues are put next to their fields. */
  onSave: (saved: HeatCreateInput, context: HeatFormSaveContext) => Promise<unknown>;
};

const FAMILY_LABELS: Record<(typeof ALLOY_FAMILIES)[number], string> = {
  aluminium: 'Aluminium',
  copper: 'Copper alloys',
  zinc: 'Zinc',
  iron: 'Iron',
  tin: 'Tin and pewter',
};

/**
 * The heat form, built for the furnace side: one column, 48 px targets,
 * number keypads, the hold-time clock, and every computed figure beside the
 * inputs it comes from, in the user's units. Values are checked with the
 * API's own heat schema before anything is sent.
 */
export function HeatForm({
  workshopId,
  units: preferredUnits,
  defaultValues,
  equipment,
  casters,
  defaultMouldId,
  storedCrucibleCycle,
  intro,
  submitLabel,
  pendingLabel,
  onSave,
}: HeatFormProps) {
  // The typed figures are in the units the form opened with; switching the
  // preference mid-heat must not reinterpret 1330 °F as 1330 °C.
  const [units] = useState(preferredUnits);
  const unitsChanged = units.temperatureUnit !== preferredUnits.temperatureUnit || units.massUnit !== preferredUnits.massUnit;
  const { temperatureUnit, massUnit } = units;
  const schema = useMemo(() => heatFormSchema({ temperatureUnit, massUnit }), [temperatureUnit, massUnit]);
  const form = useForm<HeatFormValues, unknown, HeatCreateInput>({ resolver: zodResolver(schema), defaultValues });
  const { register, formState, setValue } = form;
  const { errors } = formState;
  const [problem, setProblem] = useState<string | null>(null);

  // Re-rendering on every keystroke is what keeps the figures live; the form is small enough for that.
  const values = form.watch();
  const meltStarted = Boolean(values.meltStartedAt) && !values.pouredAt;
  const now = useNow(meltStarted);
  const live = liveFiguresOf(values, units, equipment, now, storedCrucibleCycle);
  const { figures, alloy, pourRange } = live;

  const t = temperatureSymbol(temperatureUnit);
  const targetText = parseDecimal(values.targetPourTemp);
  const targetC = typeof targetText === 'number' ? temperatureFromInput(targetText, temperatureUnit) : null;
  const furnace = equipment.furnaces.find((f) => f.id === values.furnaceId) ?? null;
  const pourC = pourOf(values, units);
  const fieldCautions = live.cautions.filter((c) => c.id !== 'safety_checklist_incomplete');
  const unticked = SAFETY_CHECKS.filter((check) => !values.safety[check]);
  const offeredCrucibles = equipment.crucibles.filter((c) => !c.retired || c.id === defaultValues.crucibleId);

  // Registered selects also get their default as a prop: react-hook-form
  // reads a select whose first option is merely "selected" (not
  // defaultSelected) as edited before mount, and would skip its default.

  const onSubmit = form.handleSubmit(
    async (saved) => {
      setProblem(null);
      try {
        await onSave(saved, { values: form.getValues(), dirtyFields: formState.dirtyFields as Record<string, unknown> });
      } catch (error) {
        setProblem(applyHeatServerErrors(error, form.setError, Object.keys(defaultValues)));
      }
    },
    () => setProblem('Some entries need a look; each is marked where it sits.'),
  );

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={onSubmit} className="bench flex max-w-2xl flex-col gap-8" aria-label="Heat">
        {intro}
        {unitsChanged ? (
          <Notice tone="info" title={`This form stays in ${temperatureSymbol(temperatureUnit)} and ${massSymbol(massUnit)}`}>
            <p>It opened before you changed your units, so the figures you typed keep their meaning. The next form uses your new choice.</p>
          </Notice>
        ) : null}
        {problem ? (
          <Notice tone="danger" role="alert" title="Not saved yet">
            {problem}
          </Notice>
        ) : null}

        <FormSection id="heat-melt" title="Melt">
          {casters ? (
            <SelectField label="Caster" hint="Admins can log a heat for another member" defaultValue={defaultValues.casterId} {...register('casterId')}>
              {/* A new heat is the signer's unless they pick someone; an edit always names its caster. */}
              {defaultValues.casterId === '' ? <option value="">Me</option> : null}
              {casters.map((c) => (
                <option key={c.userId} value={c.userId}>
                  {c.displayName}
                </option>
              ))}
            </SelectField>
          ) : null}
          <SelectField label="Alloy" error={errors.alloy?.message} defaultValue={defaultValues.alloy} {...register('alloy')}>
            <option value="">Pick an alloy</option>
            {ALLOY_FAMILIES.map((family) => {
              const inFamily = ALLOYS.filter((a) => a.family === family);
              return inFamily.length ? (
                <optgroup key={family} label={FAMILY_LABELS[family]}>
                  {inFamily.map((a) => (
                    <option key={a.designation} value={a.designation}>
                      {a.designation} · {a.commonName}
                    </option>
                  ))}
                </optgroup>
              ) : null;
            })}
          </SelectField>
          <div className="grid gap-4 sm:grid-cols-2">
            <SelectField label="Furnace" error={errors.furnaceId?.message} defaultValue={defaultValues.furnaceId} {...register('furnaceId')}>
              <option value="">Not recorded</option>
              {equipment.furnaces.map((f) => (
                <option key={f.id} value={f.id}>
                  {f.name} ({FURNACE_KIND_LABELS[f.kind]})
                </option>
              ))}
            </SelectField>
            <div className="flex flex-col gap-1.5">
              <SelectField label="Crucible" error={errors.crucibleId?.message} defaultValue={defaultValues.crucibleId} {...register('crucibleId')}>
                <option value="">Not recorded</option>
                {offeredCrucibles.map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.name} ({CRUCIBLE_MATERIAL_LABELS[c.material]})
                  </option>
                ))}
              </SelectField>
              {live.crucible && figures.crucibleCycle !== null ? (
                <p className="text-caption text-ink">
                  Heat <span className="figures">{figures.crucibleCycle}</span> of its life: warn at{' '}
                  <span className="figures">{live.crucible.warnAt}</span>, limit <span className="figures">{live.crucible.limitAt}</span>.
                </p>
              ) : null}
            </div>
          </div>
          <HoldClock holdMin={live.holdMin} clockRunning={live.clockRunning} />
        </FormSection>

        <FormSection id="heat-temperatures" title="Temperatures">
          <Caution heading="Dry before it touches the melt" level="danger" safetySection="moisture">
            Preheat every tool, thermocouple sheath, ingot and addition before it goes near the metal: trapped water turns to steam and throws
            metal out.
          </Caution>
          <TextField
            label="Pour temperature you aim for"
            inputMode="decimal"
            autoComplete="off"
            suffix={t}
            hint={
              pourRange && alloy
                ? `${alloy.designation} pours at ${rangeText(pourRange.range, temperatureUnit)} ${MOULD_KIND_WORDS[pourRange.mouldKind]}. Not saved; it asks the furnace for a setpoint.`
                : 'Not saved; it asks the furnace for a setpoint.'
            }
            {...register('targetPourTemp')}
          />
          <div className="flex flex-col gap-2">
            <TextField label="Furnace setpoint" inputMode="decimal" autoComplete="off" suffix={t} error={errors.setpoint?.message} {...register('setpoint')} />
            <SetpointHint
              workshopId={workshopId}
              furnace={furnace}
              targetC={targetC}
              units={units}
              onUse={(setpoint) => setValue('setpoint', numberToInput(setpoint, 0), { shouldDirty: true, shouldValidate: formState.isSubmitted })}
            />
          </div>
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField label="Peak melt temperature" inputMode="decimal" autoComplete="off" suffix={t} error={errors.peakTemp?.message} {...register('peakTemp')} />
            <TextField label="Pour temperature" inputMode="decimal" autoComplete="off" suffix={t} error={errors.pourTemp?.message} {...register('pourTemp')} />
          </div>
          <Figures label="Pour figures">
            <Figure
              label="Superheat"
              heat
              value={figures.superheatC === null ? null : formatTemperatureDifference(figures.superheatC, temperatureUnit)}
              missing="Pick the alloy and enter the pour temperature"
            >
              {alloy ? superheatText(figures, alloy.designation, temperatureUnit) : null}
            </Figure>
            <Figure label="Pouring range" heat value={pourRange ? rangeText(pourRange.range, temperatureUnit) : null} missing="Pick the alloy">
              {pourRange ? `${MOULD_KIND_WORDS[pourRange.mouldKind]}${pourC === null ? '' : `; this pour is ${rangePositionText(pourC, pourRange.range, temperatureUnit)}`}` : null}
            </Figure>
            <Figure
              label="Hydrogen the melt can hold at the pour"
              value={figures.hydrogen ? hydrogenValue(figures.hydrogen) : null}
              missing="For aluminium alloys, once the pour temperature is in"
            >
              {figures.hydrogen ? hydrogenText(figures.hydrogen, temperatureUnit) : null}
            </Figure>
          </Figures>
        </FormSection>

        <FormSection id="heat-charge" title="Charge">
          <ChargeLinesField units={units} />
          <WeighOutHint
            workshopId={workshopId}
            moulds={equipment.moulds}
            suggestedMouldId={values.castings.find((k) => k.mouldId)?.mouldId ?? defaultMouldId}
            casterId={values.casterId || undefined}
            alloy={alloy?.designation}
            units={units}
          />
          <TextField
            label="Left in the crucible after the pour"
            inputMode="decimal"
            autoComplete="off"
            suffix={massSymbol(massUnit)}
            error={errors.crucibleRemainder?.message}
            {...register('crucibleRemainder')}
          />
          <Figures label="Charge figures">
            <Figure label="Charged" value={figures.chargeG > 0 ? formatMass(figures.chargeG, massUnit) : null} missing="Enter the charge lines' masses" />
            <Figure
              label="Yield"
              value={figures.yieldPct === null ? null : percent(figures.yieldPct)}
              missing={values.castings.length === 0 ? 'Add the castings and weigh them' : 'Weigh every casting to see the yield'}
            >
              {remainderText(figures, units)}
            </Figure>
          </Figures>
        </FormSection>

        <FormSection id="heat-treatment" title="Flux and melt treatment">
          <Caution heading="Flux gives off fume" safetySection="fume">
            Add flux under extraction and stand back from the fume. Borax is not an aluminium flux: use one made for aluminium, dry and warm.
          </Caution>
          <div className="grid gap-4 sm:grid-cols-2">
            <SelectField label="Flux" error={errors.fluxKind?.message} defaultValue={defaultValues.fluxKind} {...register('fluxKind')}>
              {HEAT_FLUX_KINDS.map((kind) => (
                <option key={kind} value={kind}>
                  {kind === 'none' ? 'none' : FLUX_KIND_LABELS[kind]}
                </option>
              ))}
            </SelectField>
            <TextField
              label="Flux used"
              inputMode="decimal"
              autoComplete="off"
              suffix={massSymbol(massUnit)}
              disabled={values.fluxKind === 'none'}
              error={errors.fluxAmount?.message}
              {...register('fluxAmount')}
            />
          </div>
          <SelectField label="Degassing" error={errors.degassing?.message} defaultValue={defaultValues.degassing} {...register('degassing')}>
            {DEGASSING_METHODS.map((m) => (
              <option key={m} value={m}>
                {DEGASSING_LABELS[m]}
              </option>
            ))}
          </SelectField>
          <TriStateField control={form.control} name="skimmed" legend="Skimmed before the pour" />
          <TriStateField control={form.control} name="toolsPreheated" legend="Tools preheated" />
        </FormSection>

        <FormSection id="heat-air" title="Air in the shop">
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField label="Air temperature" inputMode="decimal" autoComplete="off" suffix={t} error={errors.ambientTemp?.message} {...register('ambientTemp')} />
            <TextField
              label="Relative humidity"
              inputMode="decimal"
              autoComplete="off"
              suffix="%"
              error={errors.relativeHumidityPct?.message}
              {...register('relativeHumidityPct')}
            />
          </div>
          <Figures label="Air figures">
            <Figure label="Dew point" value={figures.dewPointC === null ? null : formatTemperature(figures.dewPointC, temperatureUnit)} missing="Enter the air temperature and humidity">
              {figures.humidityRisk ? `${HUMIDITY_RISK_WORDS[figures.humidityRisk]}. ${humidityBandsText(temperatureUnit)}` : null}
            </Figure>
          </Figures>
        </FormSection>

        <FormSection id="heat-castings" title="Castings">
          <CastingsField moulds={equipment.moulds} units={units} defaultMouldId={defaultMouldId} />
        </FormSection>

        <FormSection id="heat-after" title="After the pour">
          <SelectField label="Crucible shock" hint="A fast heat-up or a quench can crack a crucible" error={errors.crucibleShock?.message} defaultValue={defaultValues.crucibleShock} {...register('crucibleShock')}>
            {CRUCIBLE_SHOCKS.map((s) => (
              <option key={s} value={s}>
                {CRUCIBLE_SHOCK_LABELS[s]}
              </option>
            ))}
          </SelectField>
          <TextareaField label="Notes" error={errors.notes?.message} {...register('notes')} />
        </FormSection>

        {fieldCautions.length > 0 ? (
          <section aria-labelledby="heat-cautions-heading" className="flex flex-col gap-3">
            <h2 id="heat-cautions-heading" className="text-title font-semibold text-ink">
              Cautions for this heat
            </h2>
            {fieldCautions.map((c) => (
              <Caution key={c.id} heading={c.title} level={CAUTION_LOOK[c.id].level} safetySection={CAUTION_LOOK[c.id].section}>
                {c.text}
              </Caution>
            ))}
          </section>
        ) : null}

        <fieldset className="flex flex-col gap-3">
          <legend className="mb-2 text-title font-semibold text-ink">Before you pour</legend>
          {SAFETY_CHECKS.map((check) => (
            <CheckboxField key={check} label={capitalise(SAFETY_CHECK_LABELS[check])} {...register(`safety.${check}`)} />
          ))}
          {unticked.length > 0 ? (
            <p className="text-caption text-ink">
              Not ticked: {unticked.map((c) => SAFETY_CHECK_LABELS[c]).join(', ')}. The heat can still be saved; it will carry a caution.
            </p>
          ) : null}
        </fieldset>

        <Button type="submit" variant="primary" className="min-h-14" icon={<Save aria-hidden className="size-5" />} pending={formState.isSubmitting} pendingLabel={pendingLabel}>
          {submitLabel}
        </Button>
      </form>
    </FormProvider>
  );
}

function FormSection({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={`${id}-heading`} className="flex flex-col gap-4">
      <h2 id={`${id}-heading`} className="border-b border-line pb-2 text-title font-semibold text-ink">
        {title}
      </h2>
      {children}
    </section>
  );
}

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** The typed pour temperature in °C, for the range check. */
function pourOf(values: HeatFormValues, units: Units): number | null {
  const n = parseDecimal(values.pourTemp);
  return typeof n === 'number' ? temperatureFromInput(n, units.temperatureUnit) : null;
}

/**
 * Puts the server's field issues ("chargeLines.0.massG") on the form's
 * fields; returns a message for the rest, or null when all found a field.
 */
function applyHeatServerErrors(
  error: unknown,
  setError: (name: FieldPath<HeatFormValues>, error: { type: string; message: string }, options?: { shouldFocus: boolean }) => void,
  topFields: readonly string[],
): string | null {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (error.code !== 'validation-failed' || error.issues.length === 0) return error.message;
  const leftOver: string[] = [];
  let focused = false;
  for (const issue of error.issues) {
    const segments = issue.path.split('.').filter((s) => s !== 'body').map((s) => (/^\d+$/.test(s) ? Number(s) : s));
    const path = formPathOf(segments);
    if (typeof path[0] === 'string' && topFields.includes(path[0])) {
      setError(path.join('.') as FieldPath<HeatFormValues>, { type: 'server', message: issue.message }, { shouldFocus: !focused });
      focused = true;
    } else {
      leftOver.push(issue.message);
    }
  }
  return leftOver.length > 0 ? leftOver.join(' ') : null;
}

