import { compact } from './convert';
import type { RawBuilder } from './convert';

/** Static or cyclic duty as typed; `between` are lengths (compression, extension) or angles (torsion). */
export interface DutyDraft {
  type: 'static' | 'cyclic';
  between: [string, string];
  cycles: string;
  peened: boolean;
  frequency: string;
}

export const emptyDuty = (): DutyDraft => ({ type: 'static', between: ['', ''], cycles: '', peened: false, frequency: '' });

type CyclicLike = { type: 'cyclic'; between: [number, number]; cycles: number; peened: boolean; frequency?: number } | { type: 'static' };

export function dutyFromSpec(duty: CyclicLike, text: (v: number | undefined) => string): DutyDraft {
  if (duty.type === 'static') return emptyDuty();
  return { type: 'cyclic', between: [text(duty.between[0]), text(duty.between[1])], cycles: text(duty.cycles), peened: duty.peened, frequency: text(duty.frequency) };
}

export function dutyRaw(d: DutyDraft, b: RawBuilder, words: [string, string]): Record<string, unknown> {
  if (d.type === 'static') return { type: 'static' };
  return compact({
    type: 'cyclic',
    between: [b.required('duty.between[0]', d.between[0], words[0]), b.required('duty.between[1]', d.between[1], words[1])],
    cycles: b.required('duty.cycles', d.cycles, 'the number of cycles'),
    peened: d.peened,
    frequency: b.number('duty.frequency', d.frequency),
  });
}

export function dutyPaths(d: DutyDraft): string[] {
  return d.type === 'cyclic' ? ['duty.type', 'duty.between[0]', 'duty.between[1]', 'duty.cycles', 'duty.peened', 'duty.frequency'] : ['duty.type'];
}
