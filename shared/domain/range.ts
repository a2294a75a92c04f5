import { z } from 'zod';

/** A closed interval; a single published value is stored with min = max. */
export const rangeSchema = z
  .object({ min: z.number(), max: z.number() })
  .refine((r) => r.min <= r.max, { message: 'min must not exceed max' });

export type Range = z.infer<typeof rangeSchema>;

/** Whether `value` lies inside the closed interval. */
export function inRange(value: number, range: Range): boolean {
  return value >= range.min && value <= range.max;
}
