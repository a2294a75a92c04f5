import { PUBLICATIONS, type SourceNote } from '#shared/domain/index.ts';

// Citations for the calculators whose formula the trade core computes but
// does not carry a source note for. Wording and grades follow sources.ts.

export const TEMPERATURE_SCALE_SOURCE: SourceNote = {
  citation: `${PUBLICATIONS.nistSp811}: °F = °C × 9/5 + 32 and K = °C + 273.15, exact by definition`,
  grade: 'primary',
};

export const CHVORINOV_SOURCE: SourceNote = {
  citation: `Chvorinov's rule t = B·(V/A)ⁿ with n about 2, as given in manufacturing textbooks (Askeland, DeGarmo, Groover) — from memory, not re-checked; the numbers are checked against ${PUBLICATIONS.gate2018}`,
  grade: 'memory',
};

export const PATTERN_ALLOWANCE_SOURCE: SourceNote = {
  citation: 'common practice: the pattern is made larger than the casting by the linear shrink allowance, pattern = casting × (1 + allowance); a shrink rule in inches per foot is that allowance × 12',
  grade: 'practice',
};

export const SETPOINT_METHOD_SOURCE: SourceNote = {
  citation:
    'app heuristic, not a published method: the median of (measured pour − setpoint) over this furnace’s newest heats with both readings, so one odd heat does not drag the answer',
  grade: 'heuristic',
};

export const CHARGE_MARGIN_SOURCE: SourceNote = {
  citation: 'common practice: weigh out a little more than the yield asks for, so a short pour never leaves a misrun; 10 % is this app’s starting margin',
  grade: 'practice',
};

export const DEFAULT_YIELD_SOURCE: SourceNote = {
  citation: 'about 50 % for small gravity castings with their gates and risers — from memory, not re-checked; use your own from the yield calculator',
  grade: 'memory',
};
