import { useCallback, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import type { Group } from 'three';
import type { LengthUnits } from '../../../shared/units/length-format';
import type { Nps } from '../../../shared/standards/nps';
import { cn } from '../../lib/cn';
import { deleteComponent, deletionPreview } from './model/commands/delete-component';
import { extendRun } from './model/commands/extend-run';
import { setEnd } from './model/commands/edit-node';
import { incomingRun, nodeById, runById } from './model/design-graph';
import type { EditorModel } from './model/editor-model';
import { extendTarget } from './model/extend-target';
import { IdAllocator } from './model/id-allocator';
import { PLANT_AXES, directionFromOffsets, type PlantAxis } from './model/plant-directions';
import { angleBetweenDeg, scale } from './model/vector';
import { MarkText } from './panels/MarkText';
import { useEditorKeys } from './hooks/use-editor-keys';
import { useEditorResult, useEditorSnapshot } from './hooks/use-editor-snapshot';
import { BuildBar, type BuildDraft } from './panels/BuildBar';
import { Dialog } from '../../components/ui/Dialog';
import { EditorIcon } from './panels/editor-icons';
import type { ShortcutAction } from './panels/editor-shortcuts';
import type { InsertType } from './panels/InsertOnRunForm';
import { KeysDialog } from './panels/KeysDialog';
import { NodeProperties } from './panels/NodeProperties';
import { PanelButton } from './panels/panel-bits';
import { ResultTabs } from './panels/ResultTabs';
import { RunProperties } from './panels/RunProperties';
import { StartPanel } from './panels/StartPanel';
import { SpoolSpecPanel } from './panels/SpoolSpecPanel';
import { ViewBar } from './panels/ViewBar';
import { FileMenu } from './panels/FileMenu';
import SpoolCanvas from './scene/SpoolCanvas';
import { labelsThinned } from './scene/DimensionLabels';

const DIRECTION_ACTIONS: Partial<Record<ShortcutAction, PlantAxis>> = {
  'dir-east': 'east',
  'dir-west': 'west',
  'dir-north': 'north',
  'dir-south': 'south',
  'dir-up': 'up',
  'dir-down': 'down',
};

const INSERT_ACTIONS: Partial<Record<ShortcutAction, InsertType>> = {
  'insert-tee': 'tee',
  'insert-set-on': 'set-on-branch',
  'insert-socket': 'half-coupling',
  'insert-reducer': 'reducer',
};

/**
 * The editor's screen, without any network: toolbar, 3D view, properties and results,
 * wired to one headless model. `SpoolEditor` feeds it a design and saves what it makes.
 */
export function EditorWorkspace({
  model,
  units,
  banner,
  actions,
  defaultNps,
}: {
  model: EditorModel;
  units: LengthUnits;
  /** Mode line over the editor (read-only reason, revision shown). */
  banner?: ReactNode;
  /** Save state and issue button, top right. */
  actions?: ReactNode;
  defaultNps?: Nps | null;
}) {
  const snap = useEditorSnapshot(model);
  const result = useEditorResult(model, snap);
  const { design, selection, view, readOnly } = snap;
  const [draft, setDraft] = useState<BuildDraft>({ axis: 'east', offset: { east: 1, north: 1, up: 0 }, lengthMm: null, kind: 'auto', radius: 'long', returnSide: null });
  const [insertRequest, setInsertRequest] = useState<{ type: InsertType; nonce: number } | null>(null);
  const [keysOpen, setKeysOpen] = useState(false);
  const [pendingDelete, setPendingDelete] = useState<{ id: string; count: number } | null>(null);
  const lengthRef = useRef<HTMLInputElement>(null);
  const rootRef = useRef<HTMLDivElement>(null);
  const asideRef = useRef<HTMLElement>(null);
  const modelGroup = useRef<Group | null>(null);
  // Begun: it has runs, or its main size was chosen on the start panel.
  const begun = !!design && (design.runs.length > 0 || !!design.spec?.nps);
  const from = extendTarget(design, selection);
  const fromNode = design && from ? nodeById(design, from) : undefined;
  // Doubling back on the run into the open end calls for a 180° return: ask for its side.
  const turningBackFrom = useMemo(() => {
    if (!design || !from || draft.axis === 'offset') return null;
    const feeding = incomingRun(design, from);
    if (!feeding) return null;
    const v = PLANT_AXES[draft.axis].vector;
    const d = feeding.direction;
    const len = Math.hypot(d.x, d.y, d.z);
    return (v.x * d.x + v.y * d.y + v.z * d.z) / len < -0.9999 ? d : null;
  }, [design, from, draft.axis]);

  // The arrow in the model showing where the next run goes.
  const nextRun = useMemo(() => {
    if (readOnly || !begun || !from || !result) return null;
    const end = result.openEnds.find((o) => o.nodeId === from);
    const at = end?.facePoint ?? result.workPoints.find((w) => w.nodeId === from)?.position;
    const direction = draft.axis === 'offset' ? directionFromOffsets(draft.offset.east, draft.offset.north, draft.offset.up) : PLANT_AXES[draft.axis].vector;
    if (!at || !direction || !design) return null;
    // Red when no single fitting makes that turn (in line, or over 90° without a return).
    const feeding = incomingRun(design, from);
    const out = design.runs.filter((r) => r.from === from);
    const ref = feeding?.direction ?? (out.length === 1 ? scale(out[0]!.direction, -1) : null);
    const turn = ref ? angleBetweenDeg(ref, direction) : 45;
    const valid = turn > 0.01 && (turn <= 90.01 || (turn > 179.99 && !!feeding && !!draft.returnSide));
    return { from: at, direction, lengthMm: draft.lengthMm, valid };
  }, [readOnly, begun, from, result, draft, design]);

  const addRun = useCallback(() => {
    if (!from || draft.lengthMm === null) return;
    const direction = draft.axis === 'offset' ? directionFromOffsets(draft.offset.east, draft.offset.north, draft.offset.up) : PLANT_AXES[draft.axis].vector;
    if (!direction) {
      model.apply(() => ({ ok: false, error: 'Give the offsets a direction (not all zero)' }));
      return;
    }
    const returnSide = turningBackFrom && draft.returnSide ? PLANT_AXES[draft.returnSide].vector : undefined;
    const r = model.edit((d, ctx) =>
      extendRun(
        d,
        { fromNodeId: from, direction, lengthMm: draft.lengthMm!, elbowRadius: draft.radius, ...(returnSide ? { returnSide } : {}), ...(draft.kind !== 'auto' ? { lengthKind: draft.kind } : {}) },
        ctx,
      ),
      { fit: { what: turningBackFrom ? 'the return' : 'the elbow' } },
    );
    // Hand the keys back to the editor: the next letter is a direction, not text in the box.
    if (r.ok) rootRef.current?.focus();
  }, [from, draft, model, turningBackFrom]);

  const requestDelete = useCallback(
    (id: string) => {
      const d = model.getSnapshot().design;
      if (!d) return;
      const preview = deletionPreview(d, id, { result: model.getResult(), ids: new IdAllocator(d) });
      if (preview.error) {
        model.apply(() => ({ ok: false, error: preview.error! }));
        return;
      }
      // More than the component and its own run: say what goes with it before doing it.
      if (preview.removedIds.length > 2) setPendingDelete({ id, count: preview.removedIds.length });
      else model.edit((dd, ctx) => deleteComponent(dd, { id }, ctx));
    },
    [model],
  );

  const selectStep = useCallback(
    (step: 1 | -1) => {
      if (!design) return;
      const order = [...design.nodes.map((n) => ({ type: 'node' as const, id: n.id })), ...design.runs.map((r) => ({ type: 'run' as const, id: r.id }))];
      const i = selection ? order.findIndex((o) => o.id === selection.id) : -1;
      const next = order[(i + step + order.length) % order.length];
      if (next) model.select(next);
    },
    [design, selection, model],
  );

  useEditorKeys((action) => {
    const axis = DIRECTION_ACTIONS[action];
    if (axis) {
      if (readOnly || !begun && !design) return;
      setDraft((d) => ({ ...d, axis }));
      requestAnimationFrame(() => {
        lengthRef.current?.focus();
        lengthRef.current?.select();
      });
      return;
    }
    const insert = INSERT_ACTIONS[action];
    if (insert) {
      if (readOnly) return;
      if (selection?.type !== 'run') {
        model.apply(() => ({ ok: false, error: 'Select a run first (click a pipe, or use ] and [)' }));
        return;
      }
      setInsertRequest({ type: insert, nonce: Date.now() });
      return;
    }
    switch (action) {
      case 'undo':
        model.undo();
        return;
      case 'redo':
        model.redo();
        return;
      case 'make-flange':
        if (!readOnly && selection?.type === 'node') model.edit((d) => setEnd(d, { nodeId: selection.id, end: { type: 'weld-neck-flange' } }), { fit: { what: 'the flange' } });
        return;
      case 'delete':
        if (!readOnly && selection) requestDelete(selection.id);
        return;
      case 'deselect':
        model.select(null);
        return;
      case 'select-next':
        selectStep(1);
        return;
      case 'select-previous':
        selectStep(-1);
        return;
      case 'view-iso':
        model.showPreset('iso');
        return;
      case 'view-plan':
        model.showPreset('plan');
        return;
      case 'view-elev-north':
        model.showPreset('elev-north');
        return;
      case 'view-elev-east':
        model.showPreset('elev-east');
        return;
      case 'toggle-labels': {
        const on = !(view.labels.centreToCentre || view.labels.centreToFace || view.labels.cutLengths);
        model.setView({ labels: { centreToCentre: on, centreToFace: on, cutLengths: on, welds: on } });
        return;
      }
      case 'orbit-left':
        model.stepCamera(-15, 0);
        return;
      case 'orbit-right':
        model.stepCamera(15, 0);
        return;
      case 'orbit-up':
        model.stepCamera(0, 10);
        return;
      case 'orbit-down':
        model.stepCamera(0, -10);
        return;
      case 'zoom-in':
        model.stepCamera(0, 0, 0.8);
        return;
      case 'zoom-out':
        model.stepCamera(0, 0, 1.25);
        return;
      case 'help':
        setKeysOpen(true);
        return;
    }
  }, { scope: rootRef });

  // A new selection starts at the top of its properties, not where the last one was scrolled.
  const selectedKey = selection ? `${selection.type}:${selection.id}` : '';
  useEffect(() => {
    asideRef.current?.scrollTo({ top: 0 });
  }, [selectedKey]);

  const selectedRun = design && selection?.type === 'run' ? runById(design, selection.id) : undefined;
  const selectedNode = design && selection?.type === 'node' ? nodeById(design, selection.id) : undefined;
  const onSelect = useCallback((s: typeof selection) => model.select(s), [model]);
  const errorCount = useMemo(() => result?.issues.filter((i) => i.severity === 'error').length ?? 0, [result]);

  return (
    <div ref={rootRef} tabIndex={-1} className="flex flex-col gap-2 outline-none" data-testid="spool-editor" data-read-only={readOnly ? 'true' : 'false'}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <div className="flex flex-wrap items-center gap-1">
          {!readOnly ? (
            <>
              <PanelButton onClick={() => model.undo()} disabled={!snap.canUndo} title={snap.undoLabel ? `Takes back: ${snap.undoLabel} (Ctrl+Z)` : 'Ctrl+Z'} aria-keyshortcuts="Control+Z">
                <EditorIcon name="undo" className="h-4 w-4" /> Undo
              </PanelButton>
              <PanelButton onClick={() => model.redo()} disabled={!snap.canRedo} title={snap.redoLabel ? `Does again: ${snap.redoLabel} (Ctrl+Shift+Z)` : 'Ctrl+Shift+Z'} aria-keyshortcuts="Control+Shift+Z">
                <EditorIcon name="redo" className="h-4 w-4" /> Redo
              </PanelButton>
            </>
          ) : null}
          <FileMenu model={model} modelGroup={modelGroup} readOnly={readOnly} />
          <PanelButton onClick={() => setKeysOpen(true)} title="Every shortcut of the editor (?)" aria-keyshortcuts="Shift+?">
            <EditorIcon name="keyboard" className="h-4 w-4" /> Keys
          </PanelButton>
        </div>
        <div className="flex flex-wrap items-center gap-2">{actions}</div>
      </div>
      {banner}
      {!readOnly && design && !begun ? <StartPanel model={model} defaultNps={defaultNps ?? null} /> : null}
      {!readOnly && begun ? (
        <BuildBar
          ref={lengthRef}
          draft={draft}
          onDraft={setDraft}
          onAdd={addRun}
          fromLabel={fromNode ? <MarkText result={result} design={design} id={fromNode.id} /> : null}
          units={units}
          disabled={!from}
          turningBackFrom={turningBackFrom}
        />
      ) : null}
      <p role="status" aria-live="polite" className={cn('min-h-5 text-sm', snap.lastError ? 'font-semibold text-danger-700' : 'text-steel-600')} data-testid="editor-status">
        {snap.lastError ?? snap.lastMessage ?? (readOnly ? 'Orbit with the mouse or a finger; click a pipe or fitting to read its dimensions.' : '')}
      </p>
      {snap.pendingFit ? (
        <div className="flex flex-wrap items-center gap-2 rounded-md border border-danger-600 bg-danger-50 px-2 py-1 text-sm" data-testid="fit-choice">
          <span className="text-ink-800">The cut list will show this run as impossible until it is lengthened.</span>
          <PanelButton tone="danger" onClick={() => model.acceptPendingFit()}>Insert anyway</PanelButton>
          <PanelButton onClick={() => model.dismissPendingFit()}>Cancel</PanelButton>
        </div>
      ) : null}
      <div className="grid gap-2 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="flex min-w-0 flex-col gap-1">
          {/* The view toolbar sits above the canvas, never over the model. */}
          <ViewBar view={view} onPreset={(p) => model.showPreset(p)} onLabels={(labels) => model.setView({ labels })} onCog={(on) => model.setView({ showCentreOfGravity: on })} />
          <div className="relative h-[32rem] overflow-hidden rounded-md border border-steel-200 bg-steel-100">
            <SpoolCanvas result={result} design={design} selection={selection} view={view} units={units} onSelect={onSelect} modelRef={modelGroup} nextRun={nextRun} />
          </div>
          {result && labelsThinned(result) ? <p className="text-xs text-ink-800">Large spool: dimension labels show around the selection.</p> : null}
          {result && result.weights.emptyKg > 0 ? (
            <p className="text-xs text-ink-800">
              About <strong>{Math.round(result.weights.emptyKg).toLocaleString('en-GB')} kg</strong> empty. Weights and centres of gravity are estimates; lifts are planned by a competent person.
            </p>
          ) : null}
        </div>
        <aside ref={asideRef} aria-label="Properties" className="max-h-[32rem] overflow-auto rounded-md border border-steel-200 bg-white p-3">
          {design && selectedRun ? (
            <RunProperties model={model} design={design} result={result} run={selectedRun} units={units} readOnly={readOnly} insertRequest={insertRequest} onDelete={requestDelete} />
          ) : design && selectedNode ? (
            <NodeProperties model={model} design={design} result={result} node={selectedNode} units={units} readOnly={readOnly} onDelete={requestDelete} />
          ) : (
            <div className="flex flex-col gap-2 text-sm text-steel-700">
              <h3 className="text-base font-semibold text-ink-900">Nothing selected</h3>
              <p>Click a pipe or fitting in the model, a piece in the cut list or a line in Checks. Keys ] and [ step through the components.</p>
              {design ? <SpoolSpecPanel model={model} design={design} result={result} units={units} readOnly={readOnly} /> : null}
              {result ? (
                <dl className="mt-2 flex flex-col gap-1">
                  <div className="flex justify-between">
                    <dt>Pieces · welds</dt>
                    <dd className="font-mono">
                      {result.pieces.length} · {result.welds.length}
                    </dd>
                  </div>
                  <div className="flex justify-between">
                    <dt>Errors · warnings</dt>
                    <dd className="font-mono">
                      {errorCount} · {result.issues.length - errorCount}
                    </dd>
                  </div>
                </dl>
              ) : null}
            </div>
          )}
        </aside>
      </div>
      {result && design ? <ResultTabs model={model} result={result} design={design} units={units} selection={selection} readOnly={readOnly} /> : null}
      <KeysDialog open={keysOpen} onClose={() => setKeysOpen(false)} />
      <Dialog open={!!pendingDelete} onClose={() => setPendingDelete(null)} title="Delete with what hangs off it?">
        {pendingDelete ? (
          <div className="flex flex-col gap-3">
            <p className="text-sm">
              Deleting <MarkText result={result} design={design} id={pendingDelete.id} /> also removes {pendingDelete.count - 1} other component{pendingDelete.count === 2 ? '' : 's'} and runs downstream of it (a branch goes with its parent). Undo brings them back.
            </p>
            <div className="flex justify-end gap-2">
              <PanelButton onClick={() => setPendingDelete(null)}>Keep them</PanelButton>
              <PanelButton
                tone="danger"
                onClick={() => {
                  const id = pendingDelete.id;
                  setPendingDelete(null);
                  model.edit((d, ctx) => deleteComponent(d, { id }, ctx));
                }}
              >
                Delete {pendingDelete.count} items
              </PanelButton>
            </div>
          </div>
        ) : null}
      </Dialog>
    </div>
  );
}
