import type { CompressionEnds, CompressionSpec, FreeParameter, Seating } from '../../core/spec';
import type { RawBuilder } from './convert';
import { compact } from './convert';
import type { DutyDraft } from './duty-draft';
import { dutyFromSpec, dutyPaths, dutyRaw, emptyDuty } from './duty-draft';
import { numberText } from './numbers';
import type { KindRaw } from './rows';
import { rowPath, sentRows } from './rows';

/** One test length with an optional force requirement, as typed. */
export interface LoadDraft {
  length: string;
  force: string;
  tolerancePercent: string;
}

/** The compression-specific part of the form, every number kept as the text typed. */
export interface CompressionDraft {
  coilsGiven: 'totalCoils' | 'activeCoils';
  coils: string;
  ends: CompressionEnds;
  freeLength: string;
  loads: LoadDraft[];
  seating: Seating;
  duty: DutyDraft;
  freeParameters: FreeParameter[];
}

export const emptyLoad = (): LoadDraft => ({ length: '', force: '', tolerancePercent: '' });

export function emptyCompression(): CompressionDraft {
  return {
    coilsGiven: 'totalCoils', coils: '', ends: 'closed-ground', freeLength: '', loads: [emptyLoad()], seating: 'both-fixed',
    duty: emptyDuty(), freeParameters: [],
  };
}

export const loadsFromSpec = (loads: readonly { length: number; force?: number; tolerancePercent?: number }[]): LoadDraft[] =>
  loads.map((l) => ({ length: numberText(l.length), force: numberText(l.force), tolerancePercent: numberText(l.tolerancePercent) }));

export function compressionFromSpec(s: CompressionSpec): CompressionDraft {
  const coilsGiven = s.totalCoils !== undefined ? 'totalCoils' : 'activeCoils';
  return {
    coilsGiven, coils: numberText(s[coilsGiven]), ends: s.ends, freeLength: numberText(s.freeLength), loads: loadsFromSpec(s.loads),
    seating: s.seating, duty: dutyFromSpec(s.duty, numberText), freeParameters: [...s.freeParameters],
  };
}

export function loadsRaw(loads: LoadDraft[], b: RawBuilder, rows: number[]): Record<string, unknown>[] {
  return sentRows(loads, rows, (l, i) => compact({
    length: b.required(`loads[${i}].length`, l.length, 'a test length'),
    force: b.number(`loads[${i}].force`, l.force),
    tolerancePercent: b.number(`loads[${i}].tolerancePercent`, l.tolerancePercent),
  }));
}

/** The compression fields of the raw spec; text that is not a number becomes an error on its path. */
export function compressionRaw(d: CompressionDraft, b: RawBuilder): KindRaw {
  const rows: number[] = [];
  const raw = compact({
    [d.coilsGiven]: b.required(d.coilsGiven, d.coils, 'a number of coils'),
    ends: d.ends,
    freeLength: b.required('freeLength', d.freeLength, 'the free length'),
    loads: loadsRaw(d.loads, b, rows),
    seating: d.seating,
    duty: dutyRaw(d.duty, b, ['the longer working length', 'the shorter working length']),
    freeParameters: d.freeParameters,
  });
  return { raw, formPath: (path) => rowPath(path, 'loads', rows) };
}

export function compressionPaths(d: CompressionDraft): string[] {
  const paths = [d.coilsGiven, 'ends', 'freeLength', 'seating', 'directionOfWind', ...dutyPaths(d.duty)];
  d.loads.forEach((_, i) => paths.push(`loads[${i}].length`, `loads[${i}].force`, `loads[${i}].tolerancePercent`));
  return paths;
}
