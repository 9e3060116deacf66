import type { ReactNode } from 'react';
import { REVIEW_CAUTION, STORED_ENERGY_CAUTION } from '../../core/documents/cautions';

/** A caution the estimator must not miss: striped edge, a title that says what the danger is. */
export function Caution({ title, children, tone = 'hazard' }: { title: string; children: ReactNode; tone?: 'hazard' | 'notice' }) {
  return (
    <aside className={`caution caution--${tone}`} aria-label={`Caution: ${title}`}>
      <p className="caution__title">{title}</p>
      <div className="caution__text">{children}</div>
    </aside>
  );
}

export function StoredEnergyCaution() {
  return <Caution title="Stored energy">{STORED_ENERGY_CAUTION}</Caution>;
}

export function ReviewCaution() {
  return <Caution title="Results support review; they do not replace it" tone="notice">{REVIEW_CAUTION}</Caution>;
}

export function HydrogenCaution({ finish, bake }: { finish: string; bake: string | null }) {
  return (
    <Caution title="Hydrogen embrittlement">
      {finish} is electroplated. Plated high-strength spring steel can crack suddenly and without warning, sometimes
      long after delivery under steady load. {bake
        ? <>Bake to <strong>{bake}</strong>, started within that specification&apos;s window after plating.</>
        : <strong>No bake specification is named: the customer must name one before the lot goes to plating.</strong>}{' '}
      Baking lowers the risk but does not remove it; a mechanical or non-electrolytic coating avoids it.
    </Caution>
  );
}

export function NearSolidCaution({ percent, setRemoval }: { percent: number; setRemoval: boolean }) {
  return (
    <Caution title="Stress near solid">
      At solid the stress is {Math.round(percent)} % of the allowable without set removal. Solid length is only approximate and
      coils that close up take a set; keep the working length clear of solid{setRemoval
        ? ', and press every piece to solid (set removal) in a guarded fixture' : ''}.
    </Caution>
  );
}

export function FatigueCaution() {
  return (
    <Caution title="Cyclic duty" tone="notice">
      Fatigue life depends on surface condition and peening coverage as much as on the calculation: confirm
      fatigue-critical springs by process control and life tests.
    </Caution>
  );
}
