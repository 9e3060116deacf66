import type { JobDraft } from '../../../model/job-draft';
import type { KindDrafts } from '../../../model/kind-drafts';
import type { SpecDraft } from '../../../model/spec-draft';
import type { Drafts } from '../../../hooks/useJobEditor';

/** How a section changes its slice of the drafts. */
export type Edit = (change: (d: Drafts) => Drafts) => void;

export const editJob = (edit: Edit) => (patch: Partial<JobDraft>) => edit((d) => ({ ...d, job: { ...d.job, ...patch } }));
export const editSpec = (edit: Edit) => (change: (s: SpecDraft) => SpecDraft) => edit((d) => ({ ...d, spec: change(d.spec) }));

/** Changes the part of the spec draft that belongs to one kind. */
export const editKind = <K extends keyof KindDrafts>(edit: Edit, kind: K) => (change: (k: KindDrafts[K]) => KindDrafts[K]) =>
  editSpec(edit)((s) => ({ ...s, [kind]: change(s[kind]) }));
