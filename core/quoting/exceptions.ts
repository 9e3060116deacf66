/**
 * Engineering exceptions as the customer reads them on a quote: what the design will do and what we
 * recommend, never the review's internal code or the estimator's working.
 */
import type { Finding } from '../result';
import type { Spec } from '../spec';
import { unitSymbol } from '../units';

const lengthText = (v: number, units: Spec['units']) => `${v.toFixed(units === 'inch' ? 3 : 2)} ${unitSymbol('length', units)}`;

/** The shortest working length on the drawing (compression and extension), in the spec's units. */
function shortestLength(spec: Spec): number | null {
  if (spec.kind === 'torsion') return null;
  const lengths = spec.loads.map((l) => l.length).filter((v): v is number => typeof v === 'number');
  return lengths.length > 0 ? Math.min(...lengths) : null;
}

function setAtSolid(spec: Spec): string {
  const stop = shortestLength(spec);
  return 'The spring takes a permanent set when compressed to solid' +
    (stop === null ? '; we recommend a stop that keeps it off solid.' : `; we recommend a stop at ${lengthText(stop, spec.units)}.`);
}

const wording: Record<string, (spec: Spec) => string> = {
  'solid-stress-over-set-removed-allowable': setAtSolid,
  'index-not-makeable': () => 'The coil proportions are beyond what holds its diameter in coiling: coil diameters will vary more than the drawing tolerance.',
  'temperature-above-grade': () => 'The service temperature is above what the wire grade is made for: the spring will lose load in service.',
  'working-length-below-solid': () => 'A working length on the drawing is shorter than the spring\'s solid length: the spring cannot reach it.',
  'working-stress-over-allowable': () => 'At its deepest working position the spring is stressed above what the wire allows: it may take a set in service.',
  'load-outside-tolerance': () => 'A load on the drawing cannot be met within its tolerance with the dimensions given: we make to the dimensions and report the loads measured.',
  'torque-outside-tolerance': () => 'A torque on the drawing cannot be met within its tolerance with the dimensions given: we make to the dimensions and report the torques measured.',
  'fatigue-fail': () => 'The fatigue life asked for is not expected from this design: springs may break before the cycles stated.',
  'initial-tension-too-high': () => 'The initial tension asked for is more than can be coiled into this wire and coil size: we coil the most that can be held.',
  'load-length-not-above-free-length': () => 'A working length on the drawing is not beyond the spring\'s free length: the spring carries no load there.',
  'duty-length-not-above-free-length': () => 'An end of the working stroke on the drawing is not beyond the spring\'s free length: the spring carries no load there.',
  'binds-on-arbor': () => 'At its largest working angle the spring body closes onto the arbor.',
  'bending-stress-over-allowable': () => 'At its largest working angle the spring is stressed above what the wire allows: it may take a set in service.',
};

const BAKE = /^bake-/;

/** The sentence printed on the quote for one accepted finding. */
export function customerException(finding: Finding, spec: Spec): string {
  const say = wording[finding.code];
  if (say) return say(spec);
  if (BAKE.test(finding.code)) {
    return 'The hydrogen-embrittlement relief bake named for this part does not meet the usual requirements for the wire\'s strength: we bake as named, at the customer\'s request.';
  }
  const text = finding.message.charAt(0).toUpperCase() + finding.message.slice(1);
  return `Accepted as drawn: ${text}${/[.!]$/.test(text) ? '' : '.'}`;
}
