import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { ApiError, Job, JobRevision } from '../../core/api';
import type { JobChange } from '../../core/api/store';
import type { JobJudgementInput } from '../../core/quoting/judgement';
import type { Settings } from '../../core/settings/schema';
import type { UnitSystem } from '../../core/units';
import { useApi } from '../api';
import { deskId } from './desk';
import type { FormError } from '../model/errors';
import { friendlyError } from '../model/errors';
import type { Evaluation } from '../model/evaluate';
import { evaluateDraft } from '../model/evaluate';
import type { JobDraft } from '../model/job-draft';
import type { JobFieldsInput } from '../model/job-draft';
import { emptyJobDraft, jobDraftOf, jobFieldsOf, sameAsStored } from '../model/job-draft';
import type { SpecDraft } from '../model/spec-draft';
import { draftFromSpec, emptySpecDraft } from '../model/spec-draft';
import { redoTarget, timelineOf, undoTarget } from '../model/timeline';

/**
 * Quiet time after the last keystroke before the form is saved into the job's working session; the session
 * becomes one permanent revision when it closes (a deliberate save, undo, a restore, an issue, leaving the job).
 */
export const AUTOSAVE_MS = 900;

export interface Drafts {
  job: JobDraft;
  spec: SpecDraft;
}

const draftsOf = (job: Job): Drafts => ({ job: jobDraftOf(job), spec: draftFromSpec(job.spec) });

export interface EditorDefaults {
  units: UnitSystem;
  toleranceGrade: 1 | 2 | 3 | null;
  /** The shop's settings: the results route set removal the way the plan does. */
  settings?: Settings;
}

/** The job being edited: drafts, live evaluation, autosave into revisions, undo and redo over them. */
export function useJobEditor(jobId: number | null, defaults: EditorDefaults, onCreated: (job: Job) => void) {
  const api = useApi();
  const desk = useRef(deskId()).current;
  const [job, setJob] = useState<Job | null>(null);
  const [drafts, setDrafts] = useState<Drafts>(() => ({ job: emptyJobDraft(), spec: emptySpecDraft(defaults.units, defaults.toleranceGrade) }));
  const [loadError, setLoadError] = useState<ApiError | null>(null);
  const [loading, setLoading] = useState(jobId !== null);
  const [revisions, setRevisions] = useState<JobRevision[]>([]);
  const [version, setVersion] = useState(0);
  const [savedVersion, setSavedVersion] = useState(0);
  const [saving, setSaving] = useState(false);
  const [saveError, setSaveError] = useState<ApiError | null>(null);

  const evaluation: Evaluation = useMemo(() => evaluateDraft(drafts.spec, job?.spec ?? null, defaults.settings), [drafts.spec, job?.spec, defaults.settings]);
  const jobCheck = useMemo(() => jobFieldsOf(drafts.job), [drafts.job]);
  // A field that does not read keeps its saved value, so the other edits still save.
  const valid = evaluation.spec !== null && (jobCheck.errors.length === 0 || job !== null);
  const complete = valid && evaluation.errors.length === 0 && jobCheck.errors.length === 0;

  // The latest state for async work (saves, undo) that outlives the render it started in.
  const live = useRef({ job, drafts, version, savedVersion, change: undefined as JobChange | undefined });
  const inFlight = useRef<Promise<boolean> | null>(null);

  const adopt = useCallback((j: Job, replaceDrafts: boolean) => {
    if (live.current.job?.id !== j.id) live.current.change = undefined;
    live.current.job = j;
    setJob(j);
    if (replaceDrafts) {
      const next = live.current.version + 1;
      const d = draftsOf(j);
      live.current.version = next;
      live.current.savedVersion = next;
      live.current.drafts = d;
      setDrafts(d);
      setVersion(next);
      setSavedVersion(next);
    }
  }, []);

  const loadRevisions = useCallback(async (id: number): Promise<JobRevision[]> => {
    const r = await api.jobRevisions({ id });
    if (!r.ok) return [];
    setRevisions(r.value);
    return r.value;
  }, [api]);

  useEffect(() => {
    if (jobId === null) return;
    let current = true;
    void api.getJob({ id: jobId }).then((r) => {
      if (!current) return;
      setLoading(false);
      if (!r.ok) { setLoadError(r.error); return; }
      adopt(r.value, true);
      void loadRevisions(r.value.id);
    });
    return () => { current = false; };
  }, [api, jobId, adopt, loadRevisions]);

  const edit = useCallback((change: (d: Drafts) => Drafts) => {
    const next = change(live.current.drafts);
    live.current.drafts = next;
    live.current.version += 1;
    setDrafts(next);
    setVersion(live.current.version);
    setSaveError(null);
  }, []);

  /**
   * Saves what reads of the form: into the working session (`working`), or as a revision of its own. True when
   * everything typed is stored; false when something could not be (then the form stays unsaved).
   */
  const saveOnce = useCallback(async (working: boolean): Promise<boolean> => {
    const s = { ...live.current };
    if (s.version === s.savedVersion) return true;
    const spec = evaluateDraft(s.drafts.spec, s.job?.spec ?? null, defaults.settings);
    const fields = jobFieldsOf(s.drafts.job);
    if (!spec.spec || (fields.errors.length > 0 && !s.job)) return false;
    const whole = spec.errors.length === 0 && fields.errors.length === 0;
    const at = s.version;
    const markSaved = () => {
      if (!whole) return;
      live.current.savedVersion = at;
      setSavedVersion(at);
    };
    const input = { ...standingIn(fields, s.job), spec: spec.spec };
    if (s.job && sameAsStored(s.job, input)) {
      // Typed back to what is stored: nothing to save, and no empty step in the history.
      markSaved();
      return whole;
    }
    setSaving(true);
    const r = s.job
      ? await api.updateJob({ id: s.job.id, expectedRevision: s.job.revision, ...input, ...(s.change ? { change: s.change } : {}), ...(working ? { working } : {}), desk })
      : await api.createJob(input);
    setSaving(false);
    if (!r.ok) { setSaveError(r.error); return false; }
    const created = s.job === null;
    adopt(r.value, false);
    markSaved();
    setSaveError(null);
    if (created) onCreated(r.value);
    await loadRevisions(r.value.id);
    return whole;
  }, [api, adopt, loadRevisions, onCreated, defaults.settings, desk]);

  /** Saves now if there is anything to save; saves never overlap. */
  const queue = useCallback(async <T,>(work: () => Promise<T>): Promise<T> => {
    while (inFlight.current) await inFlight.current;
    const p = work();
    inFlight.current = p.then(() => true, () => false);
    try {
      return await p;
    } finally {
      inFlight.current = null;
    }
  }, []);

  const autosave = useCallback(() => queue(() => saveOnce(true)), [queue, saveOnce]);

  /** Closes the job's working session as one permanent revision (nothing happens when none is open). */
  const closeSession = useCallback(async (reason: 'saved' | 'left the job'): Promise<void> => {
    const j = live.current.job;
    // Another desk's working copy stays open when this desk saves or leaves: they may still be typing.
    if (!j?.working || j.working.desk !== desk) return;
    const r = await api.keepWorkingRevision({ id: j.id, reason, desk });
    if (!r.ok) { setSaveError(r.error); return; }
    adopt(r.value, false);
    await loadRevisions(j.id);
  }, [api, adopt, loadRevisions, desk]);

  /** A deliberate save: what is pending and the open session become one permanent revision. */
  const save = useCallback((): Promise<boolean> => queue(async () => {
    const whole = await saveOnce(false);
    await closeSession('saved');
    return whole;
  }), [queue, saveOnce, closeSession]);

  /** Leaving the job: what is pending is saved and the session kept; false when something typed cannot be stored. */
  const settle = useCallback((): Promise<boolean> => queue(async () => {
    const whole = await saveOnce(true);
    await closeSession('left the job');
    return whole;
  }), [queue, saveOnce, closeSession]);

  /** The estimator says what an edit of a quoted or ordered job is; the pending save goes again with it. */
  const setChange = useCallback(async (kind: JobChange): Promise<boolean> => {
    live.current.change = kind;
    setSaveError(null);
    return save();
  }, [save]);

  /**
   * Someone else saved the job since it was opened here (stale-revision), or is typing in it at another desk
   * (edited-elsewhere): keep what was typed here as the next revision on top of theirs, or take theirs and drop
   * it. Their version stays in the history either way: keeping mine first keeps their working copy as their
   * revision (by their name), then saves this desk's on top.
   */
  const resolveSavedElsewhere = useCallback(async (keep: 'mine' | 'saved'): Promise<boolean> => {
    const j = live.current.job;
    if (!j) return false;
    let r = await api.getJob({ id: j.id });
    if (r.ok && keep === 'mine' && r.value.working && r.value.working.desk !== desk) r = await api.keepWorkingRevision({ id: j.id, reason: 'saved' });
    if (!r.ok) { setSaveError(r.error); return false; }
    adopt(r.value, keep === 'saved');
    setSaveError(null);
    await loadRevisions(j.id);
    return keep === 'mine' ? save() : true;
  }, [api, adopt, loadRevisions, save, desk]);

  /** Saves the estimator's routing and price overrides of the saved job; the error, or null when saved. */
  const saveJudgement = useCallback(async (judgement: JobJudgementInput): Promise<ApiError | null> => {
    while (inFlight.current) await inFlight.current;
    const j = live.current.job;
    if (!j) return null;
    const r = await api.updateJob({ id: j.id, expectedRevision: j.revision, judgement, desk });
    if (!r.ok) return r.error;
    adopt(r.value, false);
    await loadRevisions(j.id);
    return null;
  }, [api, adopt, loadRevisions, desk]);

  const dirty = version !== savedVersion;
  useEffect(() => {
    if (!dirty || !valid) return;
    const timer = setTimeout(() => void autosave(), AUTOSAVE_MS);
    return () => clearTimeout(timer);
  }, [dirty, valid, version, autosave]);

  /** Back to the last saved state, dropping what was typed since. */
  const revert = useCallback(() => {
    if (live.current.job) adopt(live.current.job, true);
  }, [adopt]);

  const restoreNow = useCallback(async (id: number, revision: number): Promise<void> => {
    const r = await api.restoreRevision({ id, revision });
    if (!r.ok) { setSaveError(r.error); return; }
    adopt(r.value, true);
    await loadRevisions(id);
  }, [api, adopt, loadRevisions]);

  /** Undo or redo: a pending change is saved first (it becomes the step), or dropped when it cannot be saved. */
  const step = useCallback(async (pick: typeof undoTarget): Promise<void> => {
    if (live.current.version !== live.current.savedVersion && !(await save())) {
      revert();
      return;
    }
    const j = live.current.job;
    if (!j) return;
    const target = pick(timelineOf(await loadRevisions(j.id)));
    if (target !== null) await restoreNow(j.id, target);
  }, [loadRevisions, restoreNow, revert, save]);

  /** Restores a revision from the history; what was typed since the last save is saved first. */
  const restore = useCallback(async (revision: number): Promise<void> => {
    if (!(await save())) revert();
    const j = live.current.job;
    if (j) await restoreNow(j.id, revision);
  }, [restoreNow, revert, save]);

  const timeline = useMemo(() => timelineOf(revisions), [revisions]);
  const serverErrors: FormError[] = useMemo(() => {
    if (!saveError) return [];
    const list = saveError.details && saveError.details.length > 0 ? saveError.details : [saveError];
    return list.filter((e) => e.path !== '').map((e) => friendlyError(e));
  }, [saveError]);

  return {
    job, drafts, edit, version, evaluation, jobCheck, valid, complete, dirty, saving, saveError, serverErrors, loading, loadError,
    revisions, save, revert, restore, setChange, saveJudgement, resolveSavedElsewhere,
    /** Another desk's open working copy of this job (who is typing there, since when), or null. */
    elsewhere: job?.working && job.working.desk !== desk ? job.working : null,
    /** Takes the stored job back after a change that leaves its fields alone (archiving). */
    adoptStored: (j: Job) => adopt(j, false),
    undo: () => step(undoTarget), redo: () => step(redoTarget),
    canUndo: job !== null && (dirty || undoTarget(timeline) !== null),
    canRedo: job !== null && !dirty && redoTarget(timeline) !== null,
    /** Saves what is pending and keeps the session; false when the form cannot be saved as it stands (leaving would lose it). */
    settle,
  };
}

export type JobEditor = ReturnType<typeof useJobEditor>;

/** The job fields to save: a field that does not read keeps the job's stored value. */
function standingIn(check: ReturnType<typeof jobFieldsOf>, job: Job | null): JobFieldsInput {
  if (!job || check.errors.length === 0) return check.fields;
  const wrong = new Set(check.errors.map((e) => e.path));
  return {
    ...check.fields,
    ...(wrong.has('orderQuantity') ? { orderQuantity: job.orderQuantity } : {}),
    ...(wrong.has('leadTimeDays') ? { leadTimeDays: job.leadTimeDays } : {}),
  };
}
