import { findAlloy } from './alloys.ts';
import type { Alloy } from './alloys.ts';
import type { HeatTreatmentSchedule, HeatTreatmentStep, Temper } from './heat-treatment-schedules.ts';
import type { SourceNote } from './sources.ts';

export type HeatTreatmentPlan = {
  designation: string;
  temper: Temper;
  description: string;
  steps: HeatTreatmentStep[];
  /** Every publication behind the steps, each once. */
  sources: SourceNote[];
  /** Set when the schedule was borrowed from the library alloy a workshop alloy is based on. */
  inheritedFrom?: string;
};

// A workshop alloy with no schedules of its own borrows those of the library
// alloy it is based on, so "wheel scrap, assumed A356" still gets a T6 plan.
function schedulesOf(alloy: Alloy): { schedules: HeatTreatmentSchedule[]; inheritedFrom?: string } {
  if (alloy.heatTreatments.length > 0 || !alloy.basedOn) return { schedules: alloy.heatTreatments };
  const base = findAlloy(alloy.basedOn);
  return base ? { schedules: base.heatTreatments, inheritedFrom: base.designation } : { schedules: [] };
}

/**
 * The heat-treatment steps (temperatures °C, times min, quench medium and
 * delay) for an alloy and temper, with their sources; undefined when the alloy
 * accepts no such temper.
 */
export function heatTreatmentPlan(alloy: Alloy, temper: Temper): HeatTreatmentPlan | undefined {
  const { schedules, inheritedFrom } = schedulesOf(alloy);
  const schedule = schedules.find((s) => s.temper === temper);
  if (!schedule) return undefined;

  const sources: SourceNote[] = [];
  for (const step of schedule.steps) {
    const notes = step.kind === 'quench' ? [step.source, step.delaySource] : [step.source];
    for (const note of notes) {
      if (!sources.some((s) => s.citation === note.citation)) sources.push(note);
    }
  }
  return {
    designation: alloy.designation,
    temper,
    description: schedule.description,
    steps: schedule.steps,
    sources,
    ...(inheritedFrom ? { inheritedFrom } : {}),
  };
}

/** Tempers an alloy accepts, in the order its schedules are listed. */
export function tempersFor(alloy: Alloy): Temper[] {
  return schedulesOf(alloy).schedules.map((s) => s.temper);
}
