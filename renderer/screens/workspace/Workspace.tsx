import { ChangeKind } from './ChangeKind';
import { SavedElsewhere } from './SavedElsewhere';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { ApiError, Job } from '../../../core/api';
import type { Settings } from '../../../core/settings/schema';
import { useApi, usePlatform } from '../../api';
import type { FormHandle } from '../../components/form/scope';
import { ScreenHeading } from '../../components/ScreenHeading';
import { TabList, TabPanel } from '../../components/Tabs';
import { useCommand } from '../../hooks/commands';
import { useNavigation } from '../../hooks/navigation';
import { useShopData } from '../../hooks/shop-data';
import { useJobEditor } from '../../hooks/useJobEditor';
import type { JobEditor } from '../../hooks/useJobEditor';
import { useStable } from '../../hooks/useStable';
import { SimilarJobsDialog } from '../shared/SimilarJobs';
import { useCopyJob } from '../shared/useCopyJob';
import { SpecForm } from './form/SpecForm';
import { CostPane } from './panes/CostPane';
import { DocumentsPane } from './panes/DocumentsPane';
import { FirstOffPane } from './panes/FirstOffPane';
import { HistoryPane } from './panes/HistoryPane';
import { PlanPane } from './panes/PlanPane';
import { ResultsPanel } from './results/ResultsPanel';
import { Toolbar } from './Toolbar';

type Tab = 'spec' | 'plan' | 'cost' | 'documents' | 'first-off' | 'history';
const tabs: { id: Tab; label: string }[] = [
  { id: 'spec', label: 'Spec & results' }, { id: 'plan', label: 'Manufacturing plan' }, { id: 'cost', label: 'Cost & price' },
  { id: 'documents', label: 'Documents' }, { id: 'first-off', label: 'First-off' }, { id: 'history', label: 'History' },
];

/** Waits for the shop's settings, so a new job starts in the shop's default units. */
export function Workspace({ jobId }: { jobId: number | null }) {
  const shop = useShopData();
  if (!shop.settings) {
    return <p className="screen" role="status">{shop.error ? `The shop settings could not be read: ${shop.error.message}` : 'Opening…'}</p>;
  }
  return <JobWorkspace jobId={jobId} settings={shop.settings} />;
}

function JobWorkspace({ jobId, settings }: { jobId: number | null; settings: Settings }) {
  const nav = useNavigation();
  const platform = usePlatform();
  const onCreated = useCallback((job: Job) => nav.setJobLabel(job.number, job.id), [nav]);
  const editor = useJobEditor(jobId, { units: settings.defaults.units, toleranceGrade: null, settings }, onCreated);
  const [tab, setTab] = useState<Tab>('spec');
  // The similar list's subject is named once as it opens: an autosave that first stores a new job while the list
  // is open must not rename it under the reader (the list only re-asks, leaving the job itself out).
  const [similarFor, setSimilarFor] = useState<string | null>(null);
  const form = useRef<FormHandle | null>(null);
  const pending = useRef(false);
  pending.current = editor.dirty || editor.saving;

  useEffect(() => {
    if (editor.job) nav.setJobLabel(editor.job.number, editor.job.id);
    else if (jobId === null) nav.setJobLabel('New job', null);
  }, [editor.job, jobId, nav]);
  useEffect(() => {
    nav.setLeaveGuard(editor.settle);
    return () => nav.setLeaveGuard(null);
  }, [nav, editor.settle]);
  useEffect(() => platform.guardUnload(() => pending.current), [platform]);

  const api = useApi();
  const copier = useCopyJob();
  const [actionError, setActionError] = useState<ApiError | null>(null);
  const archive = async (archived: boolean) => {
    if (!editor.job) return;
    const r = await api.archiveJob({ id: editor.job.id, archived });
    if (r.ok) editor.adoptStored(r.value);
    else setActionError(r.error);
  };

  const errors = useStable(useMemo(() => [
    ...editor.jobCheck.errors,
    ...editor.evaluation.errors.map((e) => ({ ...e, path: `spec.${e.path}` })),
    ...editor.serverErrors,
  ], [editor.jobCheck.errors, editor.evaluation.errors, editor.serverErrors]));

  const understood = useStable(useMemo(() => [
    ...editor.jobCheck.understood,
    ...editor.evaluation.understood.map((u) => ({ ...u, path: `spec.${u.path}` })),
  ], [editor.jobCheck.understood, editor.evaluation.understood]));
  // A new job starts in its first field, so a drawing's figures can be typed at once.
  const fresh = jobId === null && !editor.loading;
  useEffect(() => { if (fresh) form.current?.focus('spec.kind'); }, [fresh]);

  const goTo = (path: string) => {
    setTab('spec');
    // The spec panel stays mounted behind the other tabs, so its fields can take focus at once.
    form.current?.focus(path);
  };
  const save = async () => {
    if (!(await editor.save())) form.current?.revealAll();
  };
  useCommand('save', () => void save());
  useCommand('undo', () => void editor.undo());
  useCommand('redo', () => void editor.redo());
  const openSimilar = () => {
    if (editor.evaluation.spec) setSimilarFor(editor.job ? `job ${editor.job.number} as edited` : 'this spring');
  };
  useCommand('find-similar', openSimilar);
  useCommand('print-quote', () => setTab('documents'));
  useCommand('print-traveller', () => setTab('documents'));

  if (editor.loading) return <p className="screen" role="status">Opening job…</p>;
  if (editor.loadError) return <p className="screen error-text" role="alert">{editor.loadError.message}</p>;
  const title = editor.drafts.job.partNumber || (editor.job ? `Job ${editor.job.number}` : 'Compression spring');
  return (
    <section className="screen screen--workspace" aria-labelledby="job-title">
      <ScreenHeading id="job-title" visuallyHidden>{editor.job ? `Job ${editor.job.number}` : 'New job'}</ScreenHeading>
      <Toolbar editor={editor} problems={errors.length} onSave={() => void save()} onSimilar={openSimilar}
        onCopy={() => { if (editor.job) void copier.copy(editor.job.id); }} onArchive={(on) => void archive(on)} />
      {copier.error ?? actionError ? <p className="error-text" role="alert">{(copier.error ?? actionError)?.message}</p> : null}
      <ChangeKind editor={editor} />
      <SavedElsewhere editor={editor} />
      <TabList<Tab> label="Job views" idPrefix="job" tabs={tabs} active={tab} onSelect={setTab} />
      <div className="workspace__body workspace__body--bench" hidden={tab !== 'spec'}>
        <TabPanel idPrefix="job" id="spec">
          <div className="bench">
            <SpecForm drafts={editor.drafts} edit={editor.edit} errors={errors} understood={understood} handle={(h) => { form.current = h; }} />
            <ResultsPanel evaluation={editor.evaluation} version={editor.version} title={title}
              onGo={(p) => goTo(`spec.${p}`)} />
          </div>
        </TabPanel>
      </div>
      {tab !== 'spec' ? (
        <div className="workspace__body">
          {tab === 'plan' ? <TabPanel idPrefix="job" id="plan"><PlanPane editor={editor} onGo={(p) => goTo(`spec.${p}`)} /></TabPanel> : null}
          {tab === 'cost' ? <TabPanel idPrefix="job" id="cost"><CostPane editor={editor} /></TabPanel> : null}
          {tab === 'documents' ? <TabPanel idPrefix="job" id="documents"><DocumentsPane editor={editor} /></TabPanel> : null}
          {tab === 'first-off' ? <TabPanel idPrefix="job" id="first-off"><FirstOffPane editor={editor} /></TabPanel> : null}
          {tab === 'history' ? <TabPanel idPrefix="job" id="history"><HistoryPane editor={editor} /></TabPanel> : null}
        </div>
      ) : null}
      <SimilarJobsDialog open={similarFor !== null} onClose={() => setSimilarFor(null)} spec={editor.evaluation.spec}
        excludeJobId={editor.job?.id} quantity={askedQuantity(editor)} subject={similarFor ?? ''} />
    </section>
  );
}

/** The order quantity as typed (what the similar list prices at), or the stored one while the typed one does not read. */
function askedQuantity(editor: JobEditor): number | null {
  const unreadable = editor.jobCheck.errors.some((e) => e.path === 'orderQuantity');
  return unreadable ? editor.job?.orderQuantity ?? null : editor.jobCheck.fields.orderQuantity;
}
