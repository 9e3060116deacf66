import { useRef, useState } from 'react';
import type { PrintedPdf } from '../../../core/api';
import { usePlatform } from '../../api';
import { Dialog } from '../../components/Dialog';
import { Progress } from '../../components/Progress';
import { usePrinter } from '../../hooks/printing';

interface Outcome {
  jobId: number;
  file?: PrintedPdf;
  error?: string;
}

/** Travellers for every selected job, one after another, with progress and a cancel between jobs. */
export function BatchPrint({ selected, onDone }: { selected: ReadonlySet<number>; onDone(): void }) {
  const printer = usePrinter();
  const platform = usePlatform();
  const [open, setOpen] = useState(false);
  const [running, setRunning] = useState(false);
  const [outcomes, setOutcomes] = useState<Outcome[]>([]);
  const cancelled = useRef(false);
  const ids = [...selected];

  const run = async () => {
    cancelled.current = false;
    setOutcomes([]);
    setOpen(true);
    setRunning(true);
    for (const jobId of ids) {
      if (cancelled.current) break;
      const r = await printer.print('traveller', jobId);
      setOutcomes((o) => [...o, r.ok ? { jobId, file: r.value } : { jobId, error: r.error.message }]);
    }
    setRunning(false);
  };
  const done = outcomes.length;
  return (
    <>
      <button type="button" className="button" disabled={selected.size === 0 || running} onClick={() => void run()}
        title={selected.size === 0 ? 'Select jobs in the list first' : undefined}>
        Print travellers{selected.size > 0 ? ` (${selected.size})` : ''}
      </button>
      <Dialog
        title="Printing travellers" open={open}
        onClose={() => { cancelled.current = true; if (!running) { setOpen(false); onDone(); } }}
        actions={running
          ? <button type="button" className="button button--danger" onClick={() => { cancelled.current = true; }}>Cancel after this job</button>
          : <button type="button" className="button button--primary" onClick={() => { setOpen(false); onDone(); }}>Close</button>}
      >
        <Progress label="Travellers" value={done} max={ids.length} detail={`${done} of ${ids.length}${running ? '' : cancelled.current && done < ids.length ? ', cancelled' : ', finished'}`} />
        <ul className="plain-list">
          {outcomes.map((o) => (
            <li key={o.jobId}>
              {o.file
                ? <button type="button" className="link" onClick={() => platform.showPdf(o.file!)}>{o.file.fileName}</button>
                : <span className="error-text">Job {o.jobId}: {o.error}</span>}
            </li>
          ))}
        </ul>
      </Dialog>
    </>
  );
}
