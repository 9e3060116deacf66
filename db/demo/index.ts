import type { ApiResult } from '../../core/api/contract';
import { failure, success } from '../errors';
import { createJob, updateJob } from '../jobs/write';
import { saveSettings } from '../settings';
import type { Store } from '../store';
import { inTransaction } from '../store';
import { demoJobs } from './jobs';
import { demoFirstOff } from './first-off';
import { recordFirstOff } from '../first-off/records';
import { demoCustomers, demoSettings } from './shop';

const DAY_MS = 86_400_000;

function isoDay(ms: number): string {
  return new Date(ms).toISOString().slice(0, 10);
}

class DemoFailure extends Error {
  constructor(readonly result: { ok: false; error: { code: string; message: string; path: string } }) {
    super(result.error.message);
  }
}

function must<T>(result: ApiResult<T>): T {
  if (!result.ok) throw new DemoFailure(result);
  return result.value;
}

/** Fills an empty store with the DEMO shop: its settings, customers and about thirty jobs. */
export function createDemoShop(store: Store): ApiResult<{ jobs: number; customers: number }> {
  const existing = (store.sql('SELECT count(*) AS n FROM jobs').get() as { n: number }).n;
  if (existing > 0) return failure('store-not-empty', `the store already holds ${existing} jobs: the demo shop goes into a new store`, '');
  const now = store.now().getTime();
  try {
    inTransaction(store, () => {
      must(saveSettings(store, demoSettings));
      for (const job of demoJobs) {
        const customer = demoCustomers[job.customer]!;
        const stamp = new Date(now - job.daysAgo * DAY_MS).toISOString();
        const created = must(createJob(store, {
          customer: { ...customer }, partNumber: job.partNumber, drawingNumber: job.drawingNumber,
          drawingRevision: job.drawingRevision, status: 'draft', notes: job.notes, orderQuantity: job.orderQuantity ?? null,
          leadTimeDays: job.leadTimeDays ?? null, dueDate: job.dueInDays === undefined ? null : isoDay(now + job.dueInDays * DAY_MS),
          spec: job.spec,
        }, { createdAt: stamp }));
        if (job.status !== 'draft') must(updateJob(store, { id: created.id, status: job.status }, 'status'));
      }
      for (const f of demoFirstOff) {
        const id = (store.sql('SELECT id FROM jobs WHERE part_number = ?').get(f.partNumber) as { id: number }).id;
        must(recordFirstOff(store, { ...f.record, jobId: id, measuredOn: isoDay(now - f.daysAgo * DAY_MS) }));
      }
    });
  } catch (e) {
    if (e instanceof DemoFailure) return e.result;
    throw e;
  }
  return success({ jobs: demoJobs.length, customers: demoCustomers.length });
}
