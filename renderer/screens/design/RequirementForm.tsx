import type { ReactNode } from 'react';
import { CheckField, SelectField, TextField } from '../../components/form/inputs';
import type { RequirementDraft } from '../../model/requirement-draft';
import { allEnds, allLoops, gradeFamilies } from '../../model/requirement-draft';
import { unitSymbol } from '../../../core/units';
import type { Finish } from '../../../core/settings/schema';

interface Props {
  draft: RequirementDraft;
  finishes: readonly Finish[];
  set<K extends keyof RequirementDraft>(key: K, value: RequirementDraft[K]): void;
}

/** Every field path the form shows, so each error lands beside its own field. */
export const requirementFields = [
  'units', 'reference', 'envelope.bore', 'envelope.rod', 'envelope.maxOuterDiameter', 'envelope.minInnerDiameter',
  'envelope.maxSolidLength', 'envelope.maxFreeLength', 'function.type',
  'function.loads[0].length', 'function.loads[0].force', 'function.loads[1].length', 'function.loads[1].force',
  'function.loads[0].tolerancePercent', 'function.load.length', 'function.load.force', 'function.rate', 'function.rateTolerancePercent',
  'maxStressRatio', 'duty.type', 'duty.between[0]', 'duty.between[1]', 'duty.cycles', 'duty.peeningAllowed',
  'serviceTemperature.min', 'serviceTemperature.max', 'choices.wireSizes', 'choices.families', 'choices.ends', 'choices.finish',
  'choices.quantities', 'choices.mainQuantity', 'kind', 'initialTension.min', 'initialTension.max', 'mechanicalStop',
] as const;

function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="section">
      <legend>{title}</legend>
      <div className="grid grid--3">{children}</div>
    </fieldset>
  );
}

function Toggles<T extends string>({ legend, all, chosen, label, onChange }: {
  legend: string; all: readonly T[]; chosen: readonly T[]; label(v: T): string; onChange(next: T[]): void;
}) {
  return (
    <fieldset className="subsection">
      <legend>{legend}</legend>
      {all.map((v) => (
        <label key={v} className="check-inline">
          <input type="checkbox" checked={chosen.includes(v)}
            onChange={(e) => onChange(e.target.checked ? [...chosen, v] : chosen.filter((x) => x !== v))} /> {label(v)}
        </label>
      ))}
    </fieldset>
  );
}

/** The customer's requirement: envelope, function, duty and the shop's choices. */
export function RequirementForm({ draft: d, finishes, set }: Props) {
  const mm = unitSymbol('length', d.units);
  const force = unitSymbol('force', d.units);
  const extension = d.kind === 'extension';
  const loadPath = extension || d.functionType === 'two-loads' ? 'function.loads[0]' : 'function.load';
  return (
    <div className="requirement-form">
      <Group title="Part">
        <SelectField path="kind" label="Kind of spring" value={d.kind} onChange={(v) => set('kind', v)}
          choices={[{ value: 'compression', label: 'Compression' }, { value: 'extension', label: 'Extension' }]} />
        <SelectField path="units" label="Units" value={d.units} onChange={(v) => set('units', v)}
          choices={[{ value: 'metric', label: 'Metric (mm, N)' }, { value: 'inch', label: 'Inch (in, lbf)' }]} />
        <TextField path="reference" label="Customer's reference" value={d.reference} onChange={(v) => set('reference', v)} wide />
      </Group>
      <Group title="Envelope">
        <TextField path="envelope.bore" label="Bore" unit={mm} numeric value={d.bore} onChange={(v) => set('bore', v)} />
        <TextField path="envelope.maxOuterDiameter" label="Maximum OD" unit={mm} numeric value={d.maxOuterDiameter} onChange={(v) => set('maxOuterDiameter', v)} />
        {extension ? null : <>
          <TextField path="envelope.rod" label="Rod" unit={mm} numeric value={d.rod} onChange={(v) => set('rod', v)} />
          <TextField path="envelope.minInnerDiameter" label="Minimum ID" unit={mm} numeric value={d.minInnerDiameter} onChange={(v) => set('minInnerDiameter', v)} />
          <TextField path="envelope.maxSolidLength" label="Maximum solid length" unit={mm} numeric value={d.maxSolidLength} onChange={(v) => set('maxSolidLength', v)} />
        </>}
        <TextField path="envelope.maxFreeLength" label={extension ? 'Maximum free length inside the ends' : 'Maximum free length'} unit={mm} numeric value={d.maxFreeLength} onChange={(v) => set('maxFreeLength', v)} />
      </Group>
      <Group title="Function">
        {extension ? null : <SelectField path="function.type" label="Given as" value={d.functionType} onChange={(v) => set('functionType', v)}
          choices={[{ value: 'two-loads', label: 'Two loads at two lengths' }, { value: 'load-and-rate', label: 'One load and a rate' }]} />}
        <TextField path={`${loadPath}.length`} label="Length L1" unit={mm} numeric value={d.length1} onChange={(v) => set('length1', v)} />
        <TextField path={`${loadPath}.force`} label="Force F1" unit={force} numeric value={d.force1} onChange={(v) => set('force1', v)} />
        {extension || d.functionType === 'two-loads' ? <>
          <TextField path="function.loads[1].length" label="Length L2" unit={mm} numeric value={d.length2} onChange={(v) => set('length2', v)} />
          <TextField path="function.loads[1].force" label="Force F2" unit={force} numeric value={d.force2} onChange={(v) => set('force2', v)} />
        </> : <>
          <TextField path="function.rate" label="Rate" unit={unitSymbol('rate', d.units)} numeric value={d.rate} onChange={(v) => set('rate', v)} />
          <TextField path="function.rateTolerancePercent" label="Rate tolerance ±" unit="%" numeric value={d.rateTolerancePercent} onChange={(v) => set('rateTolerancePercent', v)} />
        </>}
        <TextField path="function.loads[0].tolerancePercent" label="Force tolerance ±" unit="%" numeric value={d.tolerancePercent} onChange={(v) => set('tolerancePercent', v)} />
        {extension ? <>
          <TextField path="initialTension.min" label="Initial tension, least" unit={force} numeric value={d.initialTensionMin} onChange={(v) => set('initialTensionMin', v)} />
          <TextField path="initialTension.max" label="Initial tension, most" unit={force} numeric value={d.initialTensionMax} onChange={(v) => set('initialTensionMax', v)} />
          <CheckField path="mechanicalStop" label="The assembly has a stop" checked={d.mechanicalStop} onChange={(v) => set('mechanicalStop', v)} />
        </> : <TextField path="maxStressRatio" label="Maximum stress ratio (optional)" numeric value={d.maxStressRatio} onChange={(v) => set('maxStressRatio', v)} />}
      </Group>
      <Group title="Duty and service">
        <SelectField path="duty.type" label="Duty" value={d.dutyType} onChange={(v) => set('dutyType', v)}
          choices={[{ value: 'static', label: 'Static' }, { value: 'cyclic', label: 'Cyclic' }]} />
        {d.dutyType === 'cyclic' ? <>
          <TextField path="duty.between[0]" label="Stroke from length" unit={mm} numeric value={d.strokeFrom} onChange={(v) => set('strokeFrom', v)} />
          <TextField path="duty.between[1]" label="Stroke to length" unit={mm} numeric value={d.strokeTo} onChange={(v) => set('strokeTo', v)} />
          <TextField path="duty.cycles" label="Cycles" numeric value={d.cycles} onChange={(v) => set('cycles', v)} />
          {extension ? null : <CheckField path="duty.peeningAllowed" label="Shot peening allowed" checked={d.peeningAllowed} onChange={(v) => set('peeningAllowed', v)} />}
        </> : null}
        <TextField path="serviceTemperature.min" label="Service temperature, lowest" unit={unitSymbol('temperature', d.units)} numeric value={d.temperatureMin} onChange={(v) => set('temperatureMin', v)} />
        <TextField path="serviceTemperature.max" label="Service temperature, highest" unit={unitSymbol('temperature', d.units)} numeric value={d.temperatureMax} onChange={(v) => set('temperatureMax', v)} />
      </Group>
      <Group title="Choices">
        <SelectField path="choices.wireSizes" label="Wire to try" value={d.wireSizes} onChange={(v) => set('wireSizes', v)}
          choices={[{ value: 'stock', label: 'Wire in stock' }, { value: 'priced', label: 'Standard sizes on the price list' }, { value: 'preferred', label: 'Every standard size' }]} />
        <SelectField path="choices.finish" label="Finish" value={d.finish} onChange={(v) => set('finish', v)}
          choices={[{ value: 'none', label: 'None' }, ...finishes.map((f) => ({ value: f.id, label: f.name }))]} />
        <TextField path="choices.quantities" label="Quantity breaks" hint="e.g. 500, 2000, 10000" value={d.quantities} onChange={(v) => set('quantities', v)} />
        <TextField path="choices.mainQuantity" label="Rank at quantity" hint="one of the breaks; the first if empty" numeric value={d.mainQuantity} onChange={(v) => set('mainQuantity', v)} />
        <Toggles legend="Grade families (none ticked: all)" all={gradeFamilies.map((f) => f.value)} chosen={d.families as (typeof gradeFamilies)[number]['value'][]}
          label={(v) => gradeFamilies.find((f) => f.value === v)!.label} onChange={(next) => set('families', next)} />
        {extension
          ? <Toggles legend="Loops (both ends alike)" all={allLoops} chosen={d.loops} label={(v) => v.replace('-', ' ')} onChange={(next) => set('loops', next)} />
          : <Toggles legend="End types" all={allEnds} chosen={d.ends} label={(v) => v.replace('-', ' and ')} onChange={(next) => set('ends', next)} />}
      </Group>
    </div>
  );
}
