import type { CauseStatus } from '#shared/domain/index.ts';

/** A score (0..1) in words, so the bar is never the only way to read it. */
export function scoreWords(score: number): string {
  if (score >= 0.6) return 'strong';
  if (score >= 0.35) return 'moderate';
  if (score >= 0.15) return 'weak';
  return 'slight';
}

/** Out of 100, rounded: easier to say aloud than 0.76. */
export function scorePoints(score: number): number {
  return Math.round(Math.max(0, Math.min(1, score)) * 100);
}

export const STATUS_WORDS: Record<CauseStatus, { word: string; meaning: string }> = {
  confirmed: { word: 'confirmed', meaning: 'a recorded value crossed its threshold' },
  suspected: { word: 'suspected', meaning: 'a usual suspect, not checked for want of data' },
  normal: { word: 'normal', meaning: 'the recorded values are within range' },
};
