import { shopTableLabels } from '../../../core/tolerances';
import { sourcedTables } from '../../model/sourced-tables';
import { Rows, SNumber, SSelect } from './fields';
import { useSettingsDraft } from './draft';

const grades = [{ value: '1', label: '1 fine' }, { value: '2', label: '2 medium' }, { value: '3', label: '3 coarse' }];
const bandedBy = [{ value: 'activeCoils', label: 'active coils n' }, { value: 'index', label: 'spring index w = D/d' }];

const upTo = (v: unknown) => (v === null || v === undefined || v === '' ? 'and over' : `up to ${String(v)}`);

/** A grade table (load or free length): ± % of the value, never less than the minimum, per grade and band. */
function GradeTable({ table, minimumUnit }: { table: 'load' | 'freeLength'; minimumUnit: string }) {
  const d = useSettingsDraft();
  const by = d.get(`toleranceTables.${table}.bandedBy`) === 'index' ? 'w' : 'n';
  return (
    <fieldset className="shop-table" aria-label={`The shop's ${shopTableLabels[table]} table`}>
      <legend>The shop&apos;s {shopTableLabels[table]} table <span className="badge">shop&apos;s table</span></legend>
      <div className="grid grid--5">
        <SSelect path={`toleranceTables.${table}.bandedBy`} label="Bands by" choices={bandedBy} />
      </div>
      <Rows path={`toleranceTables.${table}.rows`} noun="a band"
        title={(r) => `Grade ${String(r.grade)}, ${by} over ${String(r.over)} ${upTo(r.upTo)}`}
        blank={() => ({ grade: 2, over: 0, upTo: null, percent: 0, minimum: 0 })}>
        {(prefix) => (
          <>
            <SSelect path={`${prefix}.grade`} label="Grade" choices={grades} asNumber />
            <SNumber path={`${prefix}.over`} label={`${by} over`} />
            <SNumber path={`${prefix}.upTo`} label={`${by} up to`} nullable />
            <SNumber path={`${prefix}.percent`} label="±" unit="%" />
            <SNumber path={`${prefix}.minimum`} label="at least ±" unit={minimumUnit} />
          </>
        )}
      </Rows>
    </fieldset>
  );
}

function PlusMinusTable({ table, byLabel, byUnit, unit }: { table: 'legLength' | 'freeAngle'; byLabel: string; byUnit: string; unit: string }) {
  return (
    <fieldset className="shop-table" aria-label={`The shop's ${shopTableLabels[table]} table`}>
      <legend>The shop&apos;s {shopTableLabels[table]} table <span className="badge">shop&apos;s table</span></legend>
      <Rows path={`toleranceTables.${table}.rows`} noun="a band"
        title={(r) => `${byLabel} over ${String(r.over)} ${upTo(r.upTo)} ${byUnit}`.trim()}
        blank={() => ({ over: 0, upTo: null, plusMinus: 0 })}>
        {(prefix) => (
          <>
            <SNumber path={`${prefix}.over`} label={`${byLabel} over`} unit={byUnit} />
            <SNumber path={`${prefix}.upTo`} label={`${byLabel} up to`} unit={byUnit} nullable />
            <SNumber path={`${prefix}.plusMinus`} label="±" unit={unit} />
          </>
        )}
      </Rows>
    </fieldset>
  );
}

/** The published tables, read-only, with their sources: the shop edits only its own. */
function SourcedTables() {
  return (
    <div className="sourced-tables">
      <h3>Published tables (read-only)</h3>
      {sourcedTables.map((t) => (
        <details key={t.id} className="sourced-table">
          <summary>{t.title} <span className="badge badge--muted">{t.verified ? 'checked against the standard' : 'from a public reprint, not yet checked against the standard'}</span></summary>
          <p className="muted">{t.source}</p>
          <div className="table-wrap">
            <table className="table table--compact" aria-label={t.title}>
              <thead><tr>{t.head.map((h) => <th key={h} scope="col">{h}</th>)}</tr></thead>
              <tbody>{t.rows.map((r, i) => <tr key={i}>{r.map((c, j) => <td key={j} className={j > 0 ? 'num' : undefined}>{c}</td>)}</tr>)}</tbody>
            </table>
          </div>
        </details>
      ))}
    </div>
  );
}

export function TolerancesSection() {
  return (
    <section className="settings-section" id="settings-tolerances" aria-labelledby="settings-tolerances-title">
      <h2 id="settings-tolerances-title">Tolerances</h2>
      <p className="muted">The manufacturing plan and the traveller read these tables wherever the drawing gives no tolerance of its own.
        The first four are the shop&apos;s own (the values a new shop starts with are demo defaults, not sourced figures);
        lengths in mm, loads in N, angles in degrees; a band whose &ldquo;up to&rdquo; is left empty runs on without end.
        The published tables stay as printed.</p>
      <div className="tolerance-tables">
        <div>
          <GradeTable table="load" minimumUnit="N" />
          <GradeTable table="freeLength" minimumUnit="mm" />
          <PlusMinusTable table="legLength" byLabel="leg" byUnit="mm" unit="mm" />
          <PlusMinusTable table="freeAngle" byLabel="body coils" byUnit="" unit="°" />
        </div>
        <SourcedTables />
      </div>
    </section>
  );
}
