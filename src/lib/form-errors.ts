import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client.ts';

/**
 * Puts a 400's field issues next to the matching form fields. Returns the
 * message for the whole form (issues that name no field, or any other
 * error), or null when every issue found its field.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): string | null {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (error.code !== 'validation-failed' || error.issues.length === 0) return error.message;

  const leftOver: string[] = [];
  let focused = false;
  for (const issue of error.issues) {
    // The server names fields by path: "email", "body.email" or "mentorIds.0".
    const segments = issue.path.split('.').filter((s) => s !== 'body');
    const field = fields.find((f) => f === segments.join('.') || f === segments[0]);
    if (field) {
      setError(field, { type: 'server', message: issue.message }, { shouldFocus: !focused });
      focused = true;
    } else {
      leftOver.push(issue.message);
    }
  }
  return leftOver.length > 0 ? leftOver.join(' ') : null;
}
