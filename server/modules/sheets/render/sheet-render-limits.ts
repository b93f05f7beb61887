import { availableParallelism } from 'node:os';

/** Limits on sheet rendering (env: SHEET_RENDER_*; see server/README.md). */
export interface SheetRenderLimits {
  /** Render threads; each draws one sheet at a time. */
  threads: number;
  /** Longest one render may take once it has a thread, ms. */
  timeoutMs: number;
  /** Heap one render thread may grow to (V8 old generation), MB. */
  memoryMb: number;
  /** Requests that may wait for a thread; more are turned away at once. */
  queueLength: number;
  /** Longest a request waits for a free thread, ms. */
  waitMs: number;
}

/** Defaults: one thread per core but one (the request thread keeps a core), 1 at least. */
export function defaultSheetRenderLimits(): SheetRenderLimits {
  return {
    threads: Math.max(1, Math.min(4, availableParallelism() - 1)),
    timeoutMs: 30_000,
    memoryMb: 512,
    queueLength: 16,
    waitMs: 20_000,
  };
}
