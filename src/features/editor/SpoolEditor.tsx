import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { spoolDesignSchema, type SpoolDesign } from '../../../shared/schemas/spool-design.schema';
import { ErrorState, InlineError } from '../../components/ui/ErrorState';
import { LoadingBlock } from '../../components/ui/Spinner';
import { useCurrentUser } from '../auth/hooks/use-current-user';
import { can, roleLabels } from '../auth/permissions';
import { useJob } from '../jobs/api/get-job';
import { useCreateDraft } from '../spools/api/create-draft';
import { useSpool } from '../spools/api/get-spool';
import { useSpoolRevision } from '../spools/api/get-spool-revision';
import { useIssueDraft } from '../spools/api/issue-draft';
import { jobSpecOverrides } from '../../../shared/engine/job-spec-overrides';
import { readLocalDraft, type LocalDraft } from './api/local-draft-store';
import { EditorWorkspace } from './EditorWorkspace';
import { useDraftAutosave, type SaveStatus } from './hooks/use-draft-autosave';
import { EditorModel } from './model/editor-model';
import { ConflictDialog } from './panels/ConflictDialog';
import { IssueRevisionDialog } from './panels/IssueRevisionDialog';
import { PanelButton } from './panels/panel-bits';

const SAVE_WORDS: Record<SaveStatus, string> = {
  saved: 'All changes saved',
  unsaved: 'Unsaved changes (kept in this browser)',
  saving: 'Saving…',
  conflict: 'Someone else saved: choose a version',
  error: 'Not saved: will retry on the next change',
  off: '',
};

/**
 * The spool page's 3D editor. Loads the spool's working draft (or, read-only, its issued
 * revision), runs the headless editor model on it, autosaves with optimistic locking and
 * keeps unsaved work in the browser. Detailers and admins edit; every other role orbits
 * and reads dimensions.
 */
export default function SpoolEditor({ spoolId, readOnly }: { spoolId: string; readOnly: boolean }) {
  const user = useCurrentUser();
  const spool = useSpool(spoolId);
  const job = useJob(spool.data?.jobId ?? '');
  const draftRef = spool.data?.draft ?? null;
  const issued = spool.data?.currentRevision ?? null;
  const editing = !readOnly && !!draftRef;
  const revisionId = editing ? draftRef!.id : (issued?.id ?? draftRef?.id ?? null);
  const revision = useSpoolRevision(spoolId, revisionId);
  const units = job.data?.units ?? 'mm';
  const jobSpec = useMemo(() => jobSpecOverrides(job.data?.spec), [job.data?.spec]);
  const compute = useCallback((d: SpoolDesign) => computeSpool(d, { jobSpec, trusted: true }), [jobSpec]);
  const [model] = useState(() => new EditorModel(compute, { readOnly: true }));
  const [loaded, setLoaded] = useState<{ id: string; version: number } | null>(null);
  const [loadProblem, setLoadProblem] = useState<string | null>(null);
  const loadedId = useRef<string | null>(null);
  const pendingLocal = useRef<LocalDraft | null>(null);
  const createDraft = useCreateDraft(spoolId);
  const issue = useIssueDraft(spoolId);
  const [issueOpen, setIssueOpen] = useState(false);
  // The conflict the user put off ("decide later"); a new conflict asks again.
  const [conflictLater, setConflictLater] = useState<object | null>(null);

  useEffect(() => model.setCompute(compute), [model, compute]);
  useEffect(() => model.setUnits(units), [model, units]);
  useEffect(() => model.setReadOnly(!editing), [model, editing]);

  const autosave = useDraftAutosave({ model, spoolId, draft: editing && loaded ? loaded : null, enabled: editing && !!loaded });

  // Load each revision once; our own saves refresh the cache but must not reload the model.
  useEffect(() => {
    const rev = revision.data;
    if (!rev || loadedId.current === rev.id) return;
    loadedId.current = rev.id;
    const parsed = spoolDesignSchema.safeParse(rev.design);
    setLoadProblem(parsed.success ? null : `The stored design does not read as a spool design (${parsed.error.issues[0]?.path.join('.') ?? ''}: ${parsed.error.issues[0]?.message ?? ''}).`);
    model.replaceDesign(parsed.success ? parsed.data : null, { label: `Opened revision ${rev.letter}` });
    pendingLocal.current = null;
    if (editing && rev.state === 'draft') {
      const local = readLocalDraft(spoolId, rev.id);
      if (local && JSON.stringify(local.design) !== JSON.stringify(parsed.success ? parsed.data : null)) pendingLocal.current = local;
    }
    setLoaded({ id: rev.id, version: rev.version });
  }, [revision.data, model, editing, spoolId]);

  // Unsaved work from an earlier visit: restore it (same version) or offer the choice (older version).
  useEffect(() => {
    const local = pendingLocal.current;
    const rev = revision.data;
    if (!local || !loaded || !rev || rev.id !== loaded.id) return;
    pendingLocal.current = null;
    if (local.baseVersion === rev.version) {
      model.replaceDesign(local.design, { undoable: true, label: 'Restored unsaved changes from this browser' });
    } else {
      autosave.raiseConflict(local.design, rev);
      model.replaceDesign(local.design, { undoable: true, label: 'Your unsaved changes from this browser' });
    }
  }, [loaded, revision.data, model, autosave]);

  if (spool.isPending || (revisionId && revision.isPending)) return <LoadingBlock label="Loading the spool layout…" />;
  if (spool.isError) return <ErrorState error={spool.error} onRetry={() => void spool.refetch()} />;
  if (revision.isError) return <ErrorState error={revision.error} onRetry={() => void revision.refetch()} />;

  const mayEdit = can.editDesigns(user.role) && !readOnly;
  if (!revisionId) {
    return (
      <div className="flex flex-col items-start gap-3 p-4">
        <p className="text-sm text-steel-700">{mayEdit ? 'Nothing is laid out for this spool yet.' : 'The detailer has not laid this spool out yet.'}</p>
        {mayEdit ? (
          <PanelButton tone="primary" onClick={() => createDraft.mutate()} disabled={createDraft.isPending}>
            Start laying out
          </PanelButton>
        ) : null}
        <InlineError error={createDraft.error} />
      </div>
    );
  }

  const shown = revision.data;
  const banner = readOnly ? (
    <p className="rounded-md border border-state-issued-fg/30 bg-state-issued-bg px-3 py-2 text-sm text-state-issued-fg" data-testid="read-only-banner">
      {can.editDesigns(user.role) ? 'Read-only (archived)' : `Read-only for ${roleLabels[user.role].toLowerCase()}s`}: orbit, zoom and click to read dimensions. Showing{' '}
      {shown?.state === 'draft' ? 'the working draft (not issued yet)' : `issued revision ${shown?.letter ?? ''}`}.
    </p>
  ) : !editing ? (
    <div className="flex flex-wrap items-center gap-3 rounded-md border border-steel-300 bg-steel-50 px-3 py-2 text-sm">
      <span>Showing issued revision {shown?.letter}: issued revisions never change.</span>
      <PanelButton tone="primary" onClick={() => createDraft.mutate()} disabled={createDraft.isPending}>
        Start the next revision
      </PanelButton>
      <InlineError error={createDraft.error} />
    </div>
  ) : null;

  const errorCount = model.getResult()?.issues.filter((i) => i.severity === 'error').length ?? 0;
  const actions = editing ? (
    <>
      <span className={autosave.status === 'conflict' || autosave.status === 'error' ? 'text-sm font-semibold text-danger-700' : 'text-sm text-steel-600'} data-testid="save-status" data-status={autosave.status}>
        {SAVE_WORDS[autosave.status]}
      </span>
      {autosave.status === 'conflict' ? (
        <PanelButton tone="primary" onClick={() => setConflictLater(null)}>
          Choose a version
        </PanelButton>
      ) : (
        <PanelButton onClick={() => void autosave.saveNow()} disabled={autosave.status === 'saved' || autosave.status === 'saving'}>
          Save now
        </PanelButton>
      )}
      <PanelButton tone="primary" onClick={() => setIssueOpen(true)}>
        Issue revision {draftRef?.letter ?? ''}
      </PanelButton>
    </>
  ) : null;

  return (
    <>
      {loadProblem ? <p className="mb-2 rounded-md bg-danger-50 p-2 text-sm text-danger-700">{loadProblem}</p> : null}
      <EditorWorkspace model={model} units={units} banner={banner} actions={actions} defaultNps={null} />
      {autosave.conflict && conflictLater !== autosave.conflict ? (
        <ConflictDialog
          conflict={autosave.conflict}
          compute={compute}
          units={units}
          onKeepMine={() => void autosave.keepMine()}
          onTakeTheirs={autosave.takeTheirs}
          onLater={() => setConflictLater(autosave.conflict)}
        />
      ) : null}
      <IssueRevisionDialog
        open={issueOpen}
        onClose={() => setIssueOpen(false)}
        errorCount={errorCount}
        busy={issue.isPending}
        error={issue.error}
        onIssue={async (note, confirmReworkTo) => {
          const saved = await autosave.saveNow();
          if (!saved) return;
          issue.mutate(
            { note, version: autosave.version(), ...(confirmReworkTo ? { confirmReworkTo } : {}) },
            { onSuccess: () => setIssueOpen(false) },
          );
        }}
      />
    </>
  );
}
