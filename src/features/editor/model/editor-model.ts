import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { elementKind } from './design-graph';
import type { Selection } from './editor-selection';
import { IdAllocator, idFloorOf, type IdFloor } from './id-allocator';
import type { CommandContext } from './commands/command-context';
import type { CommandResult } from './commands/command-result';
import { DEFAULT_VIEW_PREFS, type ViewPrefs } from './view-prefs';
import { describeMisfits, newMisfits, type Misfit } from './fit-check';
import { userNames } from './user-names';
import type { LengthUnits } from '../../../../shared/units/length-format';

/** Computes the engine result of a design (the real engine in the app and tests). */
export type ComputeFn = (design: SpoolDesign) => SpoolResult;

/** One entry of the undo or redo stack. */
type HistoryEntry = { design: SpoolDesign | null; selection: Selection; label: string };

/** Everything the UI reads, as one immutable value per change (for `useSyncExternalStore`). */
export type EditorSnapshot = {
  design: SpoolDesign | null;
  selection: Selection;
  view: ViewPrefs;
  readOnly: boolean;
  canUndo: boolean;
  canRedo: boolean;
  undoLabel: string | null;
  redoLabel: string | null;
  /** The last command's refusal, in plain words; cleared by the next success. */
  lastError: string | null;
  /** The last command's label (for a status line / screen readers). */
  lastMessage: string | null;
  /** Increases on every design change (autosave watches it). */
  designRevision: number;
  /**
   * A fitting held back because it does not fit its run: what is missing, in words and
   * figures. `acceptPendingFit()` inserts it anyway; any other change drops it.
   */
  pendingFit: PendingFit | null;
};

/** A change waiting for the user's "insert anyway". */
export type PendingFit = { message: string; label: string; misfits: Misfit[] };

/** Held change behind a {@link PendingFit}: the design it applies to and what it makes. */
type HeldChange = { base: SpoolDesign | null; result: Extract<CommandResult, { ok: true }>; after: SpoolResult; coalesce: string | null; ids: IdFloor };

/**
 * How a command joins the history. With `fit`, a change that leaves a run too short for
 * its fittings (and a pipe piece) is held back and the snapshot's `pendingFit` says what
 * is missing; `fit.what` names the fitting ("the tee"). `fit.accept` applies it anyway.
 */
export type CommandOptions = { coalesce?: string; fit?: { what: string; accept?: boolean } };

/** What a command call tells its caller. */
export type CommandOutcome =
  | { ok: true; label: string; removedIds: string[] }
  | { ok: false; error: string; misfits?: Misfit[] };

/** Undo depth kept; older steps drop off. */
const MAX_HISTORY = 200;

/**
 * The headless spool editor: the design, the selection and the view, commands with undo
 * and redo, and the engine result derived from the design (computed once per design).
 * No React, no three: the scene and the panels subscribe and send commands.
 */
export class EditorModel {
  private design: SpoolDesign | null;
  private selection: Selection = null;
  private view: ViewPrefs = DEFAULT_VIEW_PREFS;
  private readonly undoStack: HistoryEntry[] = [];
  private readonly redoStack: HistoryEntry[] = [];
  private lastError: string | null = null;
  /** Coalesce key of the last successful command (null: none). */
  private lastCoalesce: string | null = null;
  private lastMessage: string | null = null;
  private designRevision = 0;
  private idFloor: IdFloor;
  private readOnly: boolean;
  private snapshot: EditorSnapshot;
  private readonly listeners = new Set<() => void>();
  private resultFor: SpoolDesign | null = null;
  private result: SpoolResult | null = null;
  private held: HeldChange | null = null;
  private pendingFit: PendingFit | null = null;
  private units: LengthUnits;

  constructor(
    private compute: ComputeFn,
    options: { design?: SpoolDesign | null; readOnly?: boolean; units?: LengthUnits } = {},
  ) {
    this.design = options.design ?? null;
    this.readOnly = options.readOnly ?? false;
    this.units = options.units ?? 'mm';
    this.idFloor = idFloorOf(this.design);
    this.snapshot = this.makeSnapshot();
  }

  /** Subscribes to every change; returns the unsubscribe function. */
  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  /** The current snapshot; the same object until something changes. */
  getSnapshot = (): EditorSnapshot => this.snapshot;

  /** The engine result of the current design, computed at most once per design. */
  getResult(): SpoolResult | null {
    if (!this.design) return null;
    if (this.resultFor !== this.design) {
      this.result = this.compute(this.design);
      this.resultFor = this.design;
    }
    return this.result;
  }

  /**
   * Runs a command against the current design. On success the old design goes on the
   * undo stack and the redo stack is cleared; on failure nothing changes but the error.
   * Commands with the same `coalesce` key in a row (a length typed keystroke by keystroke)
   * make one undo step: undo goes back to before the first of them.
   */
  apply(command: (design: SpoolDesign | null, ctx: CommandContext) => CommandResult, options: CommandOptions = {}): CommandOutcome {
    if (this.readOnly) return this.refuse('This spool is read-only for your role');
    const ids = new IdAllocator(this.design, this.idFloor);
    let result: CommandResult;
    const before = this.getResult();
    try {
      result = command(this.design, { result: before, ids });
    } catch (cause) {
      // A command bug must not leave a half-edited design; report it as a refusal.
      return this.refuse(cause instanceof Error ? cause.message : 'The change could not be made');
    }
    // Commands speak in document ids; users read shop marks (named as before the change).
    const names = userNames(before, this.design);
    if (!result.ok) return this.refuse(names.text(result.error));
    result = { ...result, label: names.text(result.label) };
    if (options.fit && result.design !== this.design) {
      const after = this.compute(result.design);
      const misfits = newMisfits(before, after);
      if (misfits.length > 0 && !options.fit.accept) {
        const message = `${describeMisfits(options.fit.what, misfits, this.units)} Lengthen the run or move the fitting, or insert it anyway.`;
        this.held = { base: this.design, result, after, coalesce: options.coalesce ?? null, ids: ids.floor() };
        this.pendingFit = { message, label: result.label, misfits };
        this.lastError = message;
        this.emit();
        return { ok: false, error: message, misfits };
      }
      return this.commit(result, options.coalesce ?? null, ids.floor(), after);
    }
    return this.commit(result, options.coalesce ?? null, ids.floor(), null);
  }

  /** Applies the change held back by `pendingFit` (the user chose "insert anyway"). */
  acceptPendingFit(): CommandOutcome {
    const held = this.held;
    if (!held || this.readOnly) return this.refuse('Nothing is waiting to be inserted');
    if (held.base !== this.design) {
      this.dropPendingFit();
      return this.refuse('The spool changed since; insert the fitting again');
    }
    return this.commit(held.result, held.coalesce, held.ids, held.after, `${held.result.label} (does not fit)`);
  }

  /** Forgets the held change ("cancel"). */
  dismissPendingFit(): void {
    if (!this.held && !this.pendingFit) return;
    this.dropPendingFit();
    this.lastError = null;
    this.emit();
  }

  /** The units lengths are stated in (besides mm) in the model's messages. */
  setUnits(units: LengthUnits): void {
    this.units = units;
  }

  private dropPendingFit(): void {
    this.held = null;
    this.pendingFit = null;
  }

  private commit(
    result: Extract<CommandResult, { ok: true }>,
    coalesce: string | null,
    floor: IdFloor,
    after: SpoolResult | null,
    message: string = result.label,
  ): CommandOutcome {
    const options = { coalesce: coalesce ?? undefined };
    this.dropPendingFit();
    const joins = options.coalesce !== undefined && options.coalesce === this.lastCoalesce && this.undoStack.length > 0;
    if (joins) this.undoStack[this.undoStack.length - 1]!.label = result.label;
    else this.push(this.undoStack, { design: this.design, selection: this.selection, label: result.label });
    this.lastCoalesce = options.coalesce ?? null;
    this.redoStack.length = 0;
    this.idFloor = floor;
    this.design = result.design;
    if (after) {
      // Already computed for the fit check: keep it rather than computing again.
      this.result = after;
      this.resultFor = result.design;
    }
    this.selection = result.select !== undefined ? result.select : this.validSelection(this.selection);
    this.lastError = null;
    this.lastMessage = message;
    this.designRevision += 1;
    this.emit();
    return { ok: true, label: result.label, removedIds: result.removedIds ?? [] };
  }

  /** Runs a command that needs a design (all but starting one). */
  edit(command: (design: SpoolDesign, ctx: CommandContext) => CommandResult, options: CommandOptions = {}): CommandOutcome {
    return this.apply((design, ctx) => (design ? command(design, ctx) : { ok: false, error: 'Start a spool first' }), options);
  }

  /** Steps back one change. */
  undo(): boolean {
    const entry = this.undoStack.pop();
    if (!entry || this.readOnly) return false;
    this.redoStack.push({ design: this.design, selection: this.selection, label: entry.label });
    this.restore(entry, `Undid: ${entry.label}`);
    return true;
  }

  /** Steps forward again after an undo. */
  redo(): boolean {
    const entry = this.redoStack.pop();
    if (!entry || this.readOnly) return false;
    this.undoStack.push({ design: this.design, selection: this.selection, label: entry.label });
    this.restore(entry, `Redid: ${entry.label}`);
    return true;
  }

  /** Selects a node or run (or nothing); unknown ids select nothing. */
  select(selection: Selection): void {
    const next = this.validSelection(selection);
    if (sameSelection(next, this.selection)) return;
    this.lastCoalesce = null;
    this.selection = next;
    this.emit();
  }

  /** Changes what is shown (labels, view preset); never part of undo. */
  setView(patch: Partial<Omit<ViewPrefs, 'labels'>> & { labels?: Partial<ViewPrefs['labels']> }): void {
    this.view = { ...this.view, ...patch, labels: { ...this.view.labels, ...patch.labels } };
    this.emit();
  }

  /** Snaps the camera to a preset (again, if it already is that preset). */
  showPreset(preset: ViewPrefs['preset']): void {
    this.setView({ preset, presetNonce: this.view.presetNonce + 1 });
  }

  /** Turns the camera from the keyboard: degrees about plant up, degrees of tilt, zoom factor (< 1 closer). */
  stepCamera(azimuthDeg: number, elevationDeg: number, zoom = 1): void {
    this.setView({ cameraStep: { azimuthDeg, elevationDeg, zoom, nonce: this.view.cameraStep.nonce + 1 } });
  }

  /**
   * Replaces the design from outside (loaded from the server, imported from a file,
   * "take theirs" after a conflict). With `undoable` the previous design stays on the
   * undo stack; otherwise history starts afresh.
   */
  replaceDesign(design: SpoolDesign | null, options: { undoable?: boolean; label?: string } = {}): void {
    if (options.undoable && !this.readOnly) {
      this.push(this.undoStack, { design: this.design, selection: this.selection, label: options.label ?? 'Replace design' });
      this.redoStack.length = 0;
    } else {
      this.undoStack.length = 0;
      this.redoStack.length = 0;
    }
    this.lastCoalesce = null;
    this.dropPendingFit();
    const floor = idFloorOf(design);
    this.idFloor = { n: Math.max(floor.n, this.idFloor.n), r: Math.max(floor.r, this.idFloor.r) };
    this.design = design;
    this.selection = this.validSelection(this.selection);
    this.lastError = null;
    this.lastMessage = options.label ?? null;
    this.designRevision += 1;
    this.emit();
  }

  /** Swaps the engine call (e.g. when the job's spec arrives); results are recomputed. */
  setCompute(compute: ComputeFn): void {
    this.compute = compute;
    this.dropPendingFit();
    this.resultFor = null;
    this.result = null;
    this.emit();
  }

  /** Switches read-only on or off (the user's role, an issued revision). */
  setReadOnly(readOnly: boolean): void {
    if (readOnly === this.readOnly) return;
    this.readOnly = readOnly;
    this.emit();
  }

  /** Clears the last error (e.g. when the user dismisses it). */
  clearError(): void {
    if (this.lastError === null) return;
    this.lastError = null;
    this.emit();
  }

  private refuse(error: string): CommandOutcome {
    this.dropPendingFit();
    this.lastError = error;
    this.emit();
    return { ok: false, error };
  }

  private restore(entry: HistoryEntry, message: string): void {
    this.dropPendingFit();
    this.lastCoalesce = null;
    this.design = entry.design;
    this.selection = this.validSelection(entry.selection);
    this.lastError = null;
    this.lastMessage = message;
    this.designRevision += 1;
    this.emit();
  }

  private push(stack: HistoryEntry[], entry: HistoryEntry): void {
    stack.push(entry);
    if (stack.length > MAX_HISTORY) stack.shift();
  }

  private validSelection(selection: Selection): Selection {
    if (!selection || !this.design) return null;
    const kind = elementKind(this.design, selection.id);
    return kind === selection.type ? selection : null;
  }

  private makeSnapshot(): EditorSnapshot {
    return {
      design: this.design,
      selection: this.selection,
      view: this.view,
      readOnly: this.readOnly,
      canUndo: !this.readOnly && this.undoStack.length > 0,
      canRedo: !this.readOnly && this.redoStack.length > 0,
      undoLabel: this.undoStack.at(-1)?.label ?? null,
      redoLabel: this.redoStack.at(-1)?.label ?? null,
      lastError: this.lastError,
      lastMessage: this.lastMessage,
      designRevision: this.designRevision,
      pendingFit: this.pendingFit,
    };
  }

  private emit(): void {
    this.snapshot = this.makeSnapshot();
    for (const listener of this.listeners) listener();
  }
}

function sameSelection(a: Selection, b: Selection): boolean {
  return a === b || (a !== null && b !== null && a.type === b.type && a.id === b.id);
}
