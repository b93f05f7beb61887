import { z } from 'zod';

// A lone surrogate half: a high one not followed by a low one, or a low one not after a high one.
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** Why `text` cannot be stored as text, or null when it can (PostgreSQL refuses NUL; UTF-8 has no lone surrogates). */
export function textProblem(text: string): string | null {
  if (text.includes('\u0000')) return 'Must not contain NUL characters';
  if (LONE_SURROGATE.test(text)) return 'Must not contain unpaired UTF-16 surrogates (not valid Unicode)';
  return null;
}

/**
 * A string that PostgreSQL and UTF-8 can hold: no NUL character, no unpaired surrogate.
 * Every text field of every request schema starts from this, so hostile strings get a
 * 400 naming the field instead of reaching the database.
 */
export function textSchema() {
  return z.string().superRefine((value, ctx) => {
    const problem = textProblem(value);
    if (problem) ctx.addIssue({ code: 'custom', message: problem });
  });
}

/**
 * Walks any JSON value and reports the path of every string (value or object key) that
 * {@link textProblem} refuses. Used for documents stored as a whole (the design envelope).
 */
export function findTextProblems(
  value: unknown,
  path: PropertyKey[] = [],
  out: Array<{ path: PropertyKey[]; message: string }> = [],
): Array<{ path: PropertyKey[]; message: string }> {
  if (out.length >= 20) return out;
  if (typeof value === 'string') {
    const problem = textProblem(value);
    if (problem) out.push({ path, message: problem });
  } else if (Array.isArray(value)) {
    value.forEach((item, i) => findTextProblems(item, [...path, i], out));
  } else if (value && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) {
      const problem = textProblem(key);
      if (problem) out.push({ path: [...path, key], message: `Field name: ${problem}` });
      findTextProblems(item, [...path, key], out);
    }
  }
  return out;
}
