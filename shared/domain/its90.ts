import { PUBLICATIONS, fromMemory } from './sources.ts';
import type { SourceNote } from './sources.ts';

/**
 * Freezing points of pure metals that define the International Temperature
 * Scale of 1990, in °C. They calibrate thermocouples and anchor the pure-metal
 * entries of the alloy table. Values recalled from the ITS-90 text.
 */
export const ITS90_FREEZING_POINTS_C = {
  tin: 231.928,
  zinc: 419.527,
  aluminium: 660.323,
  silver: 961.78,
  gold: 1064.18,
  copper: 1084.62,
} as const;

export type Its90Metal = keyof typeof ITS90_FREEZING_POINTS_C;

export const ITS90_SOURCE: SourceNote = fromMemory(PUBLICATIONS.its90);
