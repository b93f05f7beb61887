import { createRequire } from 'node:module';
import { pathToFileURL } from 'node:url';
import { Piscina } from 'piscina';
import { AppError, unprocessable } from '../../../common/app-error';
import type { SheetRenderJob, SheetRenderOutcome } from './sheet-render-job';
import type { SheetRenderLimits } from './sheet-render-limits';

/** A rendered PDF and its page count. */
export interface RenderedSheet {
  pdf: Buffer;
  pageCount: number;
}

/** Draws sheets; the server's runs them on worker threads. */
export interface SheetRenderer {
  /**
   * Throws the 503 a render would get now because every thread is busy and the queue is
   * full: called before the design is read, so a refused request costs next to nothing.
   */
  admit(): void;
  render(job: SheetRenderJob): Promise<RenderedSheet>;
  close(): Promise<void>;
}

// A render thread needs the TypeScript loader the server runs under. Under `node --import tsx`
// and `tsx` the threads inherit it with execArgv; elsewhere (vitest) it is added by path.
function workerExecArgv(): string[] | undefined {
  if (process.execArgv.some((a) => a.includes('tsx'))) return undefined;
  const loader = createRequire(import.meta.url).resolve('tsx');
  return ['--import', pathToFileURL(loader).href];
}

function busy(message: string): AppError {
  return new AppError(503, 'service_unavailable', message, { retryAfterSeconds: 10 });
}

/**
 * Sheet rendering on a piscina pool: PDFs are drawn off the request thread, one per thread,
 * each with a time and a heap limit, so no design (however large) holds up other requests.
 * Requests wait their turn in a bounded queue of our own, so waiting and drawing have
 * separate limits and separate messages.
 */
export class PooledSheetRenderer implements SheetRenderer {
  private pool: Piscina | null = null;
  private running = 0;
  private readonly waiting: Array<() => void> = [];

  constructor(
    readonly limits: SheetRenderLimits,
    private readonly workerUrl = new URL('./sheet-render-worker.ts', import.meta.url).href,
  ) {}

  private piscina(): Piscina {
    if (!this.pool) {
      this.pool = new Piscina({
        filename: this.workerUrl,
        minThreads: 0,
        maxThreads: this.limits.threads,
        concurrentTasksPerWorker: 1,
        // Threads idle for a minute go, and give their memory back.
        idleTimeout: 60_000,
        // Render threads run at a lower priority (nice +10 on Linux), so the request thread
        // answers other requests first when the cores are busy.
        niceIncrement: 10,
        execArgv: workerExecArgv(),
        resourceLimits: { maxOldGenerationSizeMb: this.limits.memoryMb },
      });
      // A thread lost between tasks is replaced by piscina; nothing waits on it.
      this.pool.on('error', (err: unknown) => console.error('[tackline] sheet render thread failed:', err));
    }
    return this.pool;
  }

  admit(): void {
    if (this.running >= this.limits.threads && this.waiting.length >= this.limits.queueLength)
      throw this.queueFull();
  }

  private queueFull(): AppError {
    return busy(
      `The sheet printer is busy: ${this.waiting.length} sheets are already waiting. Try again in a few seconds.`,
    );
  }

  /** Waits for a free render thread (or refuses with 503 when the queue is full or too slow). */
  private async acquire(): Promise<void> {
    if (this.running < this.limits.threads) {
      this.running += 1;
      return;
    }
    if (this.waiting.length >= this.limits.queueLength) throw this.queueFull();
    await new Promise<void>((resolve, reject) => {
      const turn = () => {
        clearTimeout(timer);
        resolve();
      };
      const timer = setTimeout(() => {
        const at = this.waiting.indexOf(turn);
        if (at >= 0) this.waiting.splice(at, 1);
        reject(
          busy(
            `The sheet printer is busy: no free renderer within ${Math.round(this.limits.waitMs / 1000)} s. Try again in a few seconds.`,
          ),
        );
      }, this.limits.waitMs);
      this.waiting.push(turn);
    });
    // The slot was handed over by release(): `running` already counts it.
  }

  private release(): void {
    const next = this.waiting.shift();
    if (next) next();
    else this.running -= 1;
  }

  async render(job: SheetRenderJob): Promise<RenderedSheet> {
    await this.acquire();
    let outcome: SheetRenderOutcome;
    try {
      outcome = (await this.piscina().run(job, {
        signal: AbortSignal.timeout(this.limits.timeoutMs),
      })) as SheetRenderOutcome;
    } catch (err) {
      throw this.limitError(err) ?? err;
    } finally {
      this.release();
    }
    if (!outcome.ok) throw unprocessable(outcome.message, outcome.details);
    return {
      pdf: Buffer.from(outcome.pdf.buffer, outcome.pdf.byteOffset, outcome.pdf.byteLength),
      pageCount: outcome.pageCount,
    };
  }

  /** The 422 for a render stopped by a limit; null for anything else. */
  private limitError(err: unknown): AppError | null {
    const e = err as { name?: string; code?: string } | null;
    const keep = 'Nothing was changed: the design is stored as it was and can still be edited.';
    const split = 'Split the spool into smaller spools, or ask your administrator about the sheet limits.';
    if (e?.name === 'AbortError')
      return unprocessable(
        `This sheet took longer than ${this.limits.timeoutMs / 1000} s to draw and was stopped. ${keep} ${split}`,
        { limit: 'time', limitMs: this.limits.timeoutMs },
      );
    if (e?.code === 'ERR_WORKER_OUT_OF_MEMORY')
      return unprocessable(
        `This sheet needed more than ${this.limits.memoryMb} MB to draw and was stopped. ${keep} ${split}`,
        { limit: 'memory', limitMb: this.limits.memoryMb },
      );
    return null;
  }

  async close(): Promise<void> {
    const pool = this.pool;
    this.pool = null;
    if (pool) await pool.destroy();
  }
}
