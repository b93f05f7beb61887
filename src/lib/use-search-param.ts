import { useCallback } from 'react';
import { useSearchParams } from 'react-router';

/**
 * One query-string value restricted to `allowed` (anything else reads as undefined).
 * Setting it (an unknown value clears it) drops `page`: a new filter starts at the first page.
 */
export function useSearchParam<T extends string>(name: string, allowed: readonly T[]): [T | undefined, (value: string) => void] {
  const [params, setParams] = useSearchParams();
  const raw = params.get(name);
  const value = raw !== null && (allowed as readonly string[]).includes(raw) ? (raw as T) : undefined;
  const set = useCallback(
    (next: string) =>
      setParams(
        (prev) => {
          const p = new URLSearchParams(prev);
          if ((allowed as readonly string[]).includes(next)) p.set(name, next);
          else p.delete(name);
          p.delete('page');
          return p;
        },
        { replace: true },
      ),
    [name, allowed, setParams],
  );
  return [value, set];
}
