import { DomainInputError } from '#shared/domain/index.ts';

export type Attempt<T> = { ok: true; value: T } | { ok: false; problem: string; field?: string };

const CODE_WORDS: Partial<Record<DomainInputError['code'], string>> = {
  'not-a-number': 'needs a number',
  negative: 'cannot be negative',
  'not-positive': 'must be above zero',
  'out-of-range': 'is outside the range this works for',
};

/**
 * Runs a trade-core computation. An impossible input (a zero mass, a yield
 * above 100 %) comes back as a sentence naming the field in the caster's
 * words instead of an exception; anything else is a bug and is rethrown.
 * @param labels the trade core's field names ("castingG") in words ("Casting mass")
 */
export function attempt<T>(compute: () => T, labels: Record<string, string> = {}): Attempt<T> {
  try {
    return { ok: true, value: compute() };
  } catch (error) {
    if (!(error instanceof DomainInputError)) throw error;
    if (error.code === 'casting-heavier-than-charge') {
      return { ok: false, problem: 'The castings cannot weigh more than the metal poured.', field: error.field };
    }
    const label = labels[error.field] ?? 'One of the values';
    return { ok: false, problem: `${label} ${CODE_WORDS[error.code] ?? 'cannot be used'}.`, field: error.field };
  }
}
