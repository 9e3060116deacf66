import { SNumber } from './fields';

/** How finely the design search steps coils and coil diameters. */
export function DesignStepsSection() {
  return (
    <section className="settings-section" id="settings-design" aria-labelledby="settings-design-title">
      <h2 id="settings-design-title">Design search</h2>
      <div className="grid grid--4">
        <SNumber path="design.coilStep" label="Coil step" hint="the coiler's resolution: 0.25 for quarter turns" />
        <SNumber path="design.diameterStep" label="Mean diameter step" unit="mm" />
      </div>
    </section>
  );
}
