import { memo } from 'react';
import { jobStatuses } from '../../../../core/api';
import { TextAreaField, SelectField, TextField } from '../../../components/form/inputs';
import { useShopData } from '../../../hooks/shop-data';
import type { JobDraft } from '../../../model/job-draft';
import { statusLabels } from '../../../model/labels';
import type { Edit } from './edit';
import { editJob } from './edit';

/** Who asks, for which part and drawing, and the order around it. */
export const JobSection = memo(function JobSection({ job, edit }: { job: JobDraft; edit: Edit }) {
  const set = editJob(edit);
  const { customers } = useShopData();
  return (
    <fieldset className="section">
      <legend>Customer &amp; part</legend>
      <div className="grid grid--3">
        <TextField path="customer.name" label="Customer" value={job.customer} onChange={(v) => set({ customer: v })} list="customer-names" wide
          hint="A new name adds the customer" />
        <datalist id="customer-names">{customers.map((c) => <option key={c.id} value={c.name} />)}</datalist>
        <TextField path="partNumber" label="Part number" value={job.partNumber} onChange={(v) => set({ partNumber: v })} />
        <TextField path="drawingNumber" label="Drawing number" value={job.drawingNumber} onChange={(v) => set({ drawingNumber: v })} />
        <TextField path="drawingRevision" label="Drawing revision" value={job.drawingRevision} onChange={(v) => set({ drawingRevision: v })} />
        <SelectField rare path="status" label="Status" value={job.status} onChange={(v) => set({ status: v })}
          choices={jobStatuses.map((s) => ({ value: s, label: statusLabels[s] }))} />
        <TextField rare path="orderQuantity" label="Order quantity" unit="pcs" numeric value={job.orderQuantity} onChange={(v) => set({ orderQuantity: v })} />
        <TextField rare path="dueDate" label="Due date" type="date" value={job.dueDate} onChange={(v) => set({ dueDate: v })} />
        <TextField rare path="leadTimeDays" label="Lead time" unit="days" numeric value={job.leadTimeDays} onChange={(v) => set({ leadTimeDays: v })} />
      </div>
      <TextAreaField rare path="notes" label="Job notes" value={job.notes} rows={2} onChange={(v) => set({ notes: v })} />
    </fieldset>
  );
});
