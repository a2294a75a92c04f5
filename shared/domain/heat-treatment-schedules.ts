import { z } from 'zod';
import { rangeSchema } from './range.ts';
import { PUBLICATIONS, fromMemory, primary, secondary, sourceNoteSchema } from './sources.ts';

// Schedules are data carried on each alloy (so a workshop alloy stored in a
// database carries its own). Times are minutes and temperatures °C, like the
// rest of the trade core; the client shows hours and °F.

export const TEMPERS = ['F', 'T4', 'T5', 'T51', 'T6', 'T61', 'T7', 'T71'] as const;
export type Temper = (typeof TEMPERS)[number];
export const temperSchema = z.enum(TEMPERS);

export const QUENCH_MEDIA = ['water', 'polymer', 'air'] as const;
export type QuenchMedium = (typeof QUENCH_MEDIA)[number];

const noteSchema = z.string().max(400).optional();

export const heatTreatmentStepSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('solution'),
    tempC: rangeSchema,
    durationMin: rangeSchema,
    source: sourceNoteSchema,
    note: noteSchema,
  }),
  z.object({
    kind: z.literal('quench'),
    medium: z.enum(QUENCH_MEDIA),
    mediumTempC: rangeSchema,
    /** Longest transfer from furnace to quench, minutes (0.25 = 15 s). */
    maxDelayMin: z.number().positive(),
    source: sourceNoteSchema,
    delaySource: sourceNoteSchema,
    note: noteSchema,
  }),
  z.object({
    kind: z.literal('artificial_age'),
    tempC: rangeSchema,
    durationMin: rangeSchema,
    source: sourceNoteSchema,
    note: noteSchema,
  }),
  z.object({
    kind: z.literal('natural_age'),
    durationMin: rangeSchema,
    source: sourceNoteSchema,
    note: noteSchema,
  }),
]);

export type HeatTreatmentStep = z.infer<typeof heatTreatmentStepSchema>;

export const heatTreatmentScheduleSchema = z.object({
  temper: temperSchema,
  description: z.string().min(1).max(300),
  steps: z.array(heatTreatmentStepSchema).min(1),
});

export type HeatTreatmentSchedule = z.infer<typeof heatTreatmentScheduleSchema>;

const HOUR = 60;

// A356.0 / 356.0 solution and quench, shared by T6, T61 and T7.
const ALSI7MG_SOLUTION: HeatTreatmentStep = {
  kind: 'solution',
  tempC: { min: 540, max: 540 },
  durationMin: { min: 6 * HOUR, max: 12 * HOUR },
  source: primary(`${PUBLICATIONS.astmB917}, A356.0-T6`),
  note:
    'Sand castings take the long end, permanent-mould castings the short end. A foundry design guide (secondary) gives 1000 °F for 4–12 h. Stay well below the 555 °C solidus: a furnace that swings ±10 °C is risky.',
};

const ALSI7MG_QUENCH: HeatTreatmentStep = {
  kind: 'quench',
  medium: 'water',
  mediumTempC: { min: 65, max: 100 },
  maxDelayMin: 0.25,
  source: secondary(`${PUBLICATIONS.foundryDesignGuide}: water at 150–212 °F`),
  delaySource: fromMemory(
    `quench-delay target of about 10–15 s; aerospace castings limits are tabulated in ${PUBLICATIONS.ams2771}`,
  ),
  note: 'Hot water distorts and cracks castings less than cold water. Move the load from furnace to tank within seconds.',
};

/** Schedules accepted by A356.0 and 356.0 (identical alloy base, same cycles). */
export const ALSI7MG_SCHEDULES: HeatTreatmentSchedule[] = [
  {
    temper: 'T6',
    description: 'Solution treated, quenched and artificially aged for strength with fair elongation.',
    steps: [
      ALSI7MG_SOLUTION,
      ALSI7MG_QUENCH,
      {
        kind: 'artificial_age',
        tempC: { min: 155, max: 155 },
        durationMin: { min: 3 * HOUR, max: 5 * HOUR },
        source: primary(`${PUBLICATIONS.astmB917}, A356.0-T6`),
      },
    ],
  },
  {
    temper: 'T61',
    description: 'As T6 with a longer age: higher strength, lower elongation.',
    steps: [
      ALSI7MG_SOLUTION,
      ALSI7MG_QUENCH,
      {
        kind: 'artificial_age',
        tempC: { min: 155, max: 155 },
        durationMin: { min: 6 * HOUR, max: 12 * HOUR },
        source: fromMemory('ASM Handbook Vol. 4, Heat Treating, A356.0-T61 cycle'),
      },
    ],
  },
  {
    temper: 'T7',
    description: 'Solution treated, quenched and overaged for dimensional and property stability.',
    steps: [
      ALSI7MG_SOLUTION,
      ALSI7MG_QUENCH,
      {
        kind: 'artificial_age',
        tempC: { min: 225, max: 225 },
        durationMin: { min: 7 * HOUR, max: 9 * HOUR },
        source: fromMemory('ASM Handbook Vol. 4, Heat Treating, A356.0-T7 cycle (about 225 °C, several hours)'),
        note: 'Duration recalled, not checked: confirm against ASTM B917 before relying on it.',
      },
    ],
  },
  {
    temper: 'T5',
    description: 'Artificially aged straight from the as-cast state, no solution treatment.',
    steps: [
      {
        kind: 'artificial_age',
        tempC: { min: 205, max: 230 },
        durationMin: { min: 7 * HOUR, max: 9 * HOUR },
        source: secondary(
          `${PUBLICATIONS.foundryDesignGuide} (400 °F for 7–9 h) and a practitioner post (440 °F for 7–9 h)`,
        ),
      },
    ],
  },
  {
    temper: 'T51',
    description: 'Artificially aged from the as-cast state for stability.',
    steps: [
      {
        kind: 'artificial_age',
        tempC: { min: 227, max: 227 },
        durationMin: { min: 7 * HOUR, max: 9 * HOUR },
        source: fromMemory('ASM heat-treating tables, 356.0-T51 age of about 227 °C'),
      },
    ],
  },
];
