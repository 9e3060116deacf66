import { machineOperations } from '../../../core/settings/schema';
import { SNumber } from './fields';

export function CostingSection() {
  return (
    <section className="settings-section" id="settings-costing" aria-labelledby="settings-costing-title">
      <h2 id="settings-costing-title">Costing</h2>
      <div className="grid grid--4">
        <SNumber path="costing.overheadPercent" label="Overhead" unit="%" />
        <SNumber path="costing.marginPercent" label="Margin" unit="%" />
        <SNumber path="costing.inspectionHourlyRate" label="Inspection rate per hour" />
        <SNumber path="costing.firstArticleMinutes" label="First article" unit="min" />
        <SNumber path="costing.inspectionMinutesPerPiece" label="Inspection per piece" unit="min" />
        <SNumber path="costing.packagingPerPiece" label="Packaging per piece" />
        <SNumber path="costing.minimumOrderValue" label="Minimum order value" />
        <SNumber path="costing.setupScrapMetres" label="Setup scrap wire" unit="m" />
      </div>
      <h3 className="subhead">Scrap allowance by operation</h3>
      <div className="grid grid--5">
        {machineOperations.map((op) => (
          <SNumber key={op} path={`costing.scrapPercentByOperation.${op}`} label={op} unit="%" optional />
        ))}
      </div>
    </section>
  );
}
