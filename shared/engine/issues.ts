/**
 * Collecting engine issues. Every check pushes onto one list; nothing throws.
 */
import type { Issue } from './compute-result';
import type { IssueCode } from './issue-codes';

/** A mutable list the engine's steps push issues onto. */
export type IssueSink = Issue[];

/** Adds an error (the numbers must not be sawn by). `componentId`: node or run id. */
export function addError(sink: IssueSink, code: IssueCode, message: string, componentId?: string): void {
  sink.push(
    componentId === undefined
      ? { severity: 'error', code, message }
      : { severity: 'error', code, message, componentId },
  );
}

/** Adds a warning (worth a look, numbers still valid). */
export function addWarning(sink: IssueSink, code: IssueCode, message: string, componentId?: string): void {
  sink.push(
    componentId === undefined
      ? { severity: 'warning', code, message }
      : { severity: 'warning', code, message, componentId },
  );
}

/** True when the list holds an error. */
export function hasErrors(sink: readonly Issue[]): boolean {
  return sink.some((i) => i.severity === 'error');
}
