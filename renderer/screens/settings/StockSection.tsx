import { useShopData } from '../../hooks/shop-data';
import { Rows, SNumber, SSelect, SText } from './fields';
import { shopToday } from '../../model/shop-days';

function useGradeChoices() {
  const { grades } = useShopData();
  return [{ value: '', label: 'Choose a grade…' }, ...grades.map((g) => ({ value: g.id, label: g.name }))];
}

export function MaterialPricesSection() {
  const grades = useGradeChoices();
  return (
    <section className="settings-section" id="settings-prices" aria-labelledby="settings-prices-title">
      <h2 id="settings-prices-title">Material prices</h2>
      <p className="muted">Price per kg by grade and diameter band (mm), with the date and supplier of the price.</p>
      <Rows path="materialPrices" noun="a price" title={(p, i) => `Price ${i + 1}: ${String(p.grade ?? '') || 'no grade'}`}
        blank={() => ({ grade: '', dMin: 0, dMax: 1, pricePerKg: 0, date: shopToday(), supplier: '' })}>
        {(prefix) => (
          <>
            <SSelect path={`${prefix}.grade`} label="Grade" choices={grades} wide />
            <SNumber path={`${prefix}.dMin`} label="d from" unit="mm" />
            <SNumber path={`${prefix}.dMax`} label="d to" unit="mm" />
            <SNumber path={`${prefix}.pricePerKg`} label="Price per kg" />
            <SText path={`${prefix}.date`} label="Price date" type="date" />
            <SText path={`${prefix}.supplier`} label="Supplier" />
          </>
        )}
      </Rows>
    </section>
  );
}

export function WireStockSection() {
  const grades = useGradeChoices();
  return (
    <section className="settings-section" id="settings-stock" aria-labelledby="settings-stock-title">
      <h2 id="settings-stock-title">Wire stock</h2>
      <p className="muted">Coils on hand by grade and diameter (mm). The manufacturing plan takes the lot&apos;s wire from here
        when the grade and size are stocked, names the heat or lot, and says &ldquo;order wire&rdquo; when they are not.</p>
      <Rows path="wireStock" noun="a coil of stock" title={(w, i) => `Stock ${i + 1}: ${String(w.grade ?? '') || 'no grade'} ${w.d ?? ''}`}
        blank={() => ({ grade: '', d: 1, kg: 0 })}>
        {(prefix) => (
          <>
            <SSelect path={`${prefix}.grade`} label="Grade" choices={grades} wide />
            <SNumber path={`${prefix}.d`} label="Wire diameter" unit="mm" />
            <SNumber path={`${prefix}.kg`} label="On hand" unit="kg" />
            <SText path={`${prefix}.heatNumber`} label="Heat / lot" />
          </>
        )}
      </Rows>
    </section>
  );
}
