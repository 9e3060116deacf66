/** What each bake specification says for one strength (or stated hardness). Never picks between them. */
import type { HardnessEstimate } from './bake-hardness';
import { hvAsHrc, isBorderline } from './bake-hardness';
import type { BakeSpecId } from './bake-specs';
import { formatQuantity } from '../format';
import type { UnitSystem } from '../units';
import { astmB850, astmF1941, iso4042, saeAms2759_9, saeUscar5, springMakerPractice } from './bake-specs';

export type BakeStatus = 'bake' | 'no-bake' | 'conditional' | 'not-covered';

export interface BakeStatement {
  spec: BakeSpecId | 'spring-maker-practice';
  title: string;
  status: BakeStatus;
  hours: { min: number; max: number | null } | null;
  temperatureC: { min: number; max: number } | null;
  startWithinHours: number | null;
  /** What the text says for this strength, in words for the traveller and the plating order. */
  says: string;
  source: string;
  verified: boolean;
  /** The hardness the decision rests on, and how it was obtained; '' when the table is by strength. */
  basis: string;
  /** The hardness estimate is too close to the threshold to decide: measure it. */
  borderline: boolean;
  /** Set on the spring maker's practice: why it conflicts with the specifications. */
  conflict: string | null;
}

type Core = Pick<BakeStatement, 'status' | 'hours' | 'temperatureC' | 'startWithinHours' | 'says'>;
type Table = { title: string; source: string; verified: boolean };

const statement = (spec: BakeStatement['spec'], t: Table, core: Core, extra: Partial<BakeStatement> = {}): BakeStatement => ({
  spec, title: t.title, source: t.source, verified: t.verified, basis: '', borderline: false, conflict: null, ...core, ...extra,
});

const fmt = (x: number, digits = 0): string => x.toFixed(digits);
const describe = (h: HardnessEstimate, unit: 'HV' | 'HRC'): string => {
  const value = unit === 'HV' ? fmt(h.hv) : fmt(h.hrc, 1);
  const prefix = h.bound === 'at-least' ? 'over ' : h.bound === 'at-most' ? 'under ' : h.measured ? '' : '≈ ';
  return `${prefix}${value} ${unit} (${h.source})`;
};

/** A strength in the job's units: the chart is in MPa, an inch job reads psi. */
const strengthText = (mpa: number, units: UnitSystem): string =>
  (units === 'metric' ? `${fmt(mpa)} MPa` : formatQuantity(mpa, 'stress', units));

export function b850(tensile: number, units: UnitSystem = 'metric'): BakeStatement {
  const t = astmB850;
  const s = (mpa: number) => strengthText(mpa, units);
  const none = { hours: null, temperatureC: null, startWithinHours: null };
  if (tensile <= t.notEssentialUpTo) {
    return statement('astm-b850', t, { ...none, status: 'no-bake', says: `up to ${s(t.notEssentialUpTo)} a bake is not essential` });
  }
  const band = t.bands.find((b) => tensile > b.over && tensile <= b.upTo);
  if (!band) {
    return statement('astm-b850', t, { ...none, status: 'not-covered',
      says: `${s(tensile)} is beyond the partial table (up to ${s(t.bands[t.bands.length - 1]!.upTo)}): take the bake from the full standard` });
  }
  return statement('astm-b850', t, {
    status: 'bake', hours: { min: band.hours, max: null }, temperatureC: t.temperatureC, startWithinHours: null,
    says: `bake at least ${band.hours} h at ${t.temperatureC.min}–${t.temperatureC.max} °C (${units === 'metric' ? `${band.over + 1}–${band.upTo} MPa` : `${s(band.over)}–${s(band.upTo)}`} band). ${t.caution}`,
  });
}

export function iso4042Rule(h: HardnessEstimate): BakeStatement {
  const t = iso4042;
  const none = { hours: null, temperatureC: null, startWithinHours: null };
  const extra = { basis: describe(h, 'HV'), borderline: isBorderline(h, hvAsHrc(t.bakeAboveHv)) || isBorderline(h, hvAsHrc(t.conditionalFromHv)) };
  const purchaser = 'the purchaser may always require baking';
  if (h.hv > t.bakeAboveHv) {
    return statement('iso-4042', t, { ...none, status: 'bake', says: `above ${t.bakeAboveHv} HV baking is required (to ISO 9588); ${t.scope}` }, extra);
  }
  if (h.hv >= t.conditionalFromHv) {
    return statement('iso-4042', t, { ...none, status: 'conditional',
      says: `${t.conditionalFromHv}–${t.bakeAboveHv} HV: baking not required if process verification and product testing are done; ${purchaser}` }, extra);
  }
  return statement('iso-4042', t, { ...none, status: 'no-bake',
    says: `under ${t.conditionalFromHv} HV the excerpt sets no bake requirement; ${purchaser}` }, extra);
}

export function uscar5(h: HardnessEstimate): BakeStatement {
  const t = saeUscar5;
  const above = h.hv > t.thresholdHv;
  const hours = above ? t.hoursAboveThreshold : t.hoursUpToThreshold;
  return statement('sae-uscar-5', t, {
    status: 'bake', hours: { min: hours, max: null }, temperatureC: { min: t.temperatureC, max: t.temperatureC }, startWithinHours: null,
    says: `${hours} h at ${t.temperatureC} °C for parts ${above ? 'above' : 'up to'} ${t.thresholdHv} HV (40 HRC)`,
  }, { basis: describe(h, 'HV'), borderline: isBorderline(h, hvAsHrc(t.thresholdHv)) });
}

export function f1941(h: HardnessEstimate): BakeStatement {
  const t = astmF1941;
  const extra = { basis: describe(h, 'HRC'), borderline: isBorderline(h, t.requiredFromHrc) };
  if (h.hrc < t.requiredFromHrc) {
    return statement('astm-f1941', t, { status: 'no-bake', hours: null, temperatureC: null, startWithinHours: null,
      says: `relief is required from ${t.requiredFromHrc} HRC; this part is below it` }, extra);
  }
  const range = `${fmt(t.temperatureC.min)}–${fmt(t.temperatureC.max)} °C (350–450 °F)`;
  return statement('astm-f1941', t, {
    status: 'bake', hours: null, temperatureC: t.temperatureC, startWithinHours: t.startWithinHours,
    says: `relief required: bake within ${t.startWithinHours} h of plating at ${range}, typically ` +
      `${t.typicalHours.min}–${t.typicalHours.max} h; ${t.scope}`,
  }, extra);
}

export function ams2759_9(): BakeStatement {
  const t = saeAms2759_9;
  return statement('sae-ams-2759-9', t, {
    status: 'bake', hours: { min: t.minHours, max: null }, temperatureC: t.temperatureC, startWithinHours: t.startWithinHours,
    says: `375 ± 25 °F (${fmt(t.temperatureC.min)}–${fmt(t.temperatureC.max)} °C) for at least ${t.minHours} h, up to about ` +
      `${t.hardestSteelHours} h for the hardest steels (take the time from the specification); start within ${t.startWithinHours} h`,
  });
}

/** The maker's practice, with the specifications at this strength whose minimum bake it falls short of. */
export function makerPractice(others: readonly BakeStatement[]): BakeStatement {
  const t = springMakerPractice;
  const longest = Math.max(t.musicWire.hours.max, t.otherSteels.hours.max);
  const shortOf = others.filter((s) => s.status === 'bake' && (s.hours?.min ?? 0) > longest);
  const conflict = shortOf.length === 0 ? null
    : `far shorter than ${shortOf.map((s) => `${s.title} (${s.hours?.min} h)`).join(', ')}: do not use unless the customer agrees in writing`;
  return statement('spring-maker-practice', t, {
    status: 'bake', hours: { min: t.musicWire.hours.min, max: longest },
    temperatureC: { min: t.musicWire.temperatureC, max: t.otherSteels.temperatureC }, startWithinHours: null,
    says: `music wire 400 °F (${fmt(t.musicWire.temperatureC)} °C) for 45–60 min; other steels 420 °F ` +
      `(${fmt(t.otherSteels.temperatureC)} °C) for 1–2 h; a ${t.tooLateHours} h delay may already be too long`,
  }, { conflict });
}
