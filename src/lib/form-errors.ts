import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { issuesOf } from './api-error';

/**
 * Puts the server's field issues (400 details) on the matching form fields.
 * Returns true when at least one landed on a field the form has.
 */
export function applyServerIssues<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly string[],
): boolean {
  let applied = false;
  for (const issue of issuesOf(error)) {
    const name = issue.path.join('.');
    if (fields.includes(name)) {
      setError(name as Path<T>, { type: 'server', message: issue.message });
      applied = true;
    }
  }
  return applied;
}
