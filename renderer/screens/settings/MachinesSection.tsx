import { machineOperations } from '../../../core/settings/schema';
import { useShopData } from '../../hooks/shop-data';
import { useSettingsDraft } from './draft';
import { Rows, SCheck, SNumber, SSelect, SText } from './fields';

const operationLabels: Record<string, string> = {
  coil: 'coiling', grind: 'end grinding', 'stress-relieve': 'stress relief (oven)', set: 'set removal', 'shot-peen': 'shot peening',
  'load-test': 'load testing', 'loop-form': 'loop forming', 'leg-form': 'leg forming', pack: 'packing',
};

function MachineFields({ prefix }: { prefix: string }) {
  const d = useSettingsDraft();
  const operation = d.get(`${prefix}.operation`);
  const batch = d.get(`${prefix}.batch`) !== undefined;
  return (
    <>
      <SText path={`${prefix}.id`} label="Work centre id" />
      <SText path={`${prefix}.name`} label="Name" wide />
      <SSelect path={`${prefix}.operation`} label="Operation" choices={machineOperations.map((o) => ({ value: o, label: operationLabels[o] ?? o }))} />
      <SNumber path={`${prefix}.hourlyRate`} label="Rate per hour" />
      <SNumber path={`${prefix}.setupMinutes`} label="Setup" unit="min" />
      <SNumber path={`${prefix}.wireRange.min`} label="Wire from" unit="mm" />
      <SNumber path={`${prefix}.wireRange.max`} label="Wire to" unit="mm" />
      {operation === 'coil' ? (
        <>
          <SNumber path={`${prefix}.speedModel.feedMetresPerMinute`} label="Wire feed" unit="m/min" />
          <SNumber path={`${prefix}.speedModel.maxPiecesPerMinute`} label="Most pieces" unit="/min" />
        </>
      ) : null}
      {operation !== 'coil' && !batch ? <SNumber path={`${prefix}.piecesPerHour`} label="Run rate" unit="pcs/h" optional /> : null}
      <SNumber path={`${prefix}.scrapPercent`} label="Own scrap" unit="%" optional />
      <div className="field field--check">
        <input type="checkbox" id={`${prefix}-batch`} checked={batch}
          onChange={(e) => d.set(`${prefix}.batch`, e.target.checked ? { capacityPieces: 1000, cycleMinutes: 60 } : undefined)} />
        <label htmlFor={`${prefix}-batch`} className="field__label">Works in batches</label>
      </div>
      {batch ? (
        <>
          <SNumber path={`${prefix}.batch.capacityPieces`} label="Pieces per batch" />
          <SNumber path={`${prefix}.batch.cycleMinutes`} label="Batch cycle" unit="min" />
        </>
      ) : null}
    </>
  );
}

export function MachinesSection() {
  const { settings } = useShopData();
  const currency = settings?.defaults.currency ?? '';
  return (
    <section className="settings-section" id="settings-machines" aria-labelledby="settings-machines-title">
      <h2 id="settings-machines-title">Machines &amp; rates</h2>
      <p className="muted">Work centres the plan routes to (by operation and wire size) and the hourly rates the cost uses, in {currency}.</p>
      <Rows path="machines" noun="a machine" title={(m, i) => `Machine ${i + 1}: ${String(m.name ?? '') || 'unnamed'}`}
        blank={() => ({ id: '', name: '', operation: 'coil', wireRange: { min: 0, max: 10 }, hourlyRate: 0, setupMinutes: 0, speedModel: { feedMetresPerMinute: 30, maxPiecesPerMinute: 30 } })}>
        {(prefix) => <MachineFields prefix={prefix} />}
      </Rows>
    </section>
  );
}

export function FinishesSection() {
  return (
    <section className="settings-section" id="settings-finishes" aria-labelledby="settings-finishes-title">
      <h2 id="settings-finishes-title">Finishes</h2>
      <p className="muted">Vendor prices and lot minimums; a finish done in house (light oil) is not outside processing. An electroplated finish needs a hydrogen-relief bake.</p>
      <Rows path="finishes" noun="a finish" title={(f, i) => `Finish ${i + 1}: ${String(f.name ?? '') || 'unnamed'}`}
        blank={() => ({ id: '', name: '', vendor: '', lotMinimum: 0, electroplated: false, inHouse: false })}>
        {(prefix) => (
          <>
            <SText path={`${prefix}.id`} label="Finish id" />
            <SText path={`${prefix}.name`} label="Name" wide />
            <SText path={`${prefix}.vendor`} label="Vendor" />
            <SNumber path={`${prefix}.pricePerKg`} label="Price per kg" optional />
            <SNumber path={`${prefix}.pricePerPiece`} label="Price per piece" optional />
            <SNumber path={`${prefix}.lotMinimum`} label="Lot minimum" />
            <SCheck path={`${prefix}.electroplated`} label="Electroplated" />
            <SCheck path={`${prefix}.inHouse`} label="Done in house" hint="Not routed as outside processing" />
            <SText path={`${prefix}.bakeSpecification`} label="Bake specification" wide />
          </>
        )}
      </Rows>
    </section>
  );
}
