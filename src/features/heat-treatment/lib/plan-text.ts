import { cToF, formatNumber, formatTemperature, type HeatTreatmentStep, type TemperatureUnit } from '#shared/domain/index.ts';
import { formatDelay, formatDurationRange, formatTemperatureRange } from '#shared/heat-treatment/compare-plan.ts';

const other = (unit: TemperatureUnit): TemperatureUnit => (unit === 'C' ? 'F' : 'C');

/** "540 °C (1004 °F)": the reader's unit first, the other in brackets, for sheets read by people who think in either. */
export function dualTemperature(c: number, unit: TemperatureUnit): string {
  return `${formatTemperature(c, unit)} (${formatTemperature(c, other(unit))})`;
}

/** "65–100 °C (149–212 °F)". */
export function dualTemperatureRange(range: { min: number; max: number }, unit: TemperatureUnit): string {
  return `${formatTemperatureRange(range, unit)} (${formatTemperatureRange(range, other(unit))})`;
}

/** A temperature as the reader types it, in their unit. */
export const inUnit = (c: number, unit: TemperatureUnit) => (unit === 'C' ? c : cToF(c));

/** The planned values of a step as short phrases: temperature, time, medium, delay. */
export function stepFacts(step: HeatTreatmentStep, unit: TemperatureUnit): { label: string; value: string }[] {
  switch (step.kind) {
    case 'solution':
    case 'artificial_age':
      return [
        { label: 'Oven', value: dualTemperatureRange(step.tempC, unit) },
        { label: 'Time at temperature', value: formatDurationRange(step.durationMin) },
      ];
    case 'natural_age':
      return [{ label: 'Time at room temperature', value: formatDurationRange(step.durationMin) }];
    case 'quench':
      return [
        { label: 'Medium', value: `${step.medium} at ${dualTemperatureRange(step.mediumTempC, unit)}` },
        { label: 'Oven to tank, at most', value: formatDelay(step.maxDelayMin * 60) },
      ];
  }
}

/** The quench medium as a word on screen. */
export const MEDIUM_WORDS: Record<string, string> = { water: 'water', polymer: 'polymer quenchant', air: 'air', other: 'other' };

export const percent = (v: number) => `${formatNumber(v, 0)} %`;
