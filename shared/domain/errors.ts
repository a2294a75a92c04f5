/**
 * One error type for inputs the trade core cannot compute with. Callers (API,
 * forms) map `field` back to the input that needs correcting and `code` to a
 * message in their own words.
 */

export const DOMAIN_ERROR_CODES = [
  'not-a-number',
  'negative',
  'not-positive',
  'out-of-range',
  'casting-heavier-than-charge',
  'invalid-rule-set',
  'invalid-prior',
] as const;

export type DomainErrorCode = (typeof DOMAIN_ERROR_CODES)[number];

/** Thrown by trade-core functions when an input is impossible (negative mass, NaN, yield above 100 %...). */
export class DomainInputError extends Error {
  // Fields are declared, not parameter properties: erasable syntax only.
  readonly field: string;
  readonly code: DomainErrorCode;

  constructor(field: string, code: DomainErrorCode, message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = 'DomainInputError';
    this.field = field;
    this.code = code;
  }
}

/**
 * Returns `value` when it is a finite number, otherwise throws.
 * @param field name of the input, reported in the error
 */
export function requireFinite(field: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new DomainInputError(field, 'not-a-number', `${field} must be a finite number`);
  }
  return value;
}

/** Returns `value` when it is finite and ≥ 0, otherwise throws. */
export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0) throw new DomainInputError(field, 'negative', `${field} must not be negative`);
  return value;
}

/** Returns `value` when it is finite and > 0, otherwise throws. */
export function requirePositive(field: string, value: number): number {
  requireFinite(field, value);
  if (value <= 0) throw new DomainInputError(field, 'not-positive', `${field} must be greater than zero`);
  return value;
}

/**
 * Returns `value` when it lies in the interval, otherwise throws.
 * @param bounds `minExclusive` makes the lower end open, e.g. a yield in (0, 100]
 */
export function requireInRange(
  field: string,
  value: number,
  bounds: { min: number; max: number; minExclusive?: boolean },
): number {
  requireFinite(field, value);
  const belowMin = bounds.minExclusive ? value <= bounds.min : value < bounds.min;
  if (belowMin || value > bounds.max) {
    const lower = bounds.minExclusive ? `(${bounds.min}` : `[${bounds.min}`;
    throw new DomainInputError(field, 'out-of-range', `${field} must lie in ${lower}, ${bounds.max}]`);
  }
  return value;
}
