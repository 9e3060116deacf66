/**
 * The trade's words and symbols that the screens, the drawings and the documents share, in one place so
 * they never disagree. Each term has a short form (data blocks, select lists, readouts) and, where prose
 * needs more, a long form (quotes and travellers). Symbols are those of EN 13906-1/-2/-3 and ISO 2162-2.
 */
import type { CompressionEnds, ExtensionEndForm, LegForm, Seating, SpringKind } from './spec';

/** A term as a short label and as the documents' prose says it. */
export interface Term {
  short: string;
  long: string;
}

const term = (short: string, long = short): Term => ({ short, long });

/** First letter up: "closed, ground" → "Closed, ground" for a select list or a heading. */
export const sentenceCase = (text: string): string => (text === '' ? text : text[0]!.toUpperCase() + text.slice(1));

export interface KindTerms {
  /** The kind in a list or a column ("Compression"). */
  label: string;
  document: { heading: string; diagramCaption: string };
  /** What the working positions are: lengths along the axis or angles of the legs. */
  workingPosition: 'length' | 'angle';
  /** The tolerance grade with the tables it reads for this kind. */
  toleranceGrade: string;
}

export const kindTerms: Record<SpringKind, KindTerms> = {
  compression: {
    label: 'Compression', workingPosition: 'length', toleranceGrade: 'Tolerance grade (EN 15800)',
    document: { heading: 'Helical compression spring', diagramCaption: 'Load–length diagram' },
  },
  extension: {
    label: 'Extension', workingPosition: 'length', toleranceGrade: 'Tolerance grade (DIN 2097 and trade extension tables)',
    document: { heading: 'Helical extension spring', diagramCaption: 'Load–length diagram (lengths inside the ends)' },
  },
  torsion: {
    label: 'Torsion', workingPosition: 'angle', toleranceGrade: 'Tolerance grade (shop torsion tables)',
    document: { heading: 'Helical torsion spring', diagramCaption: 'Torque–angle diagram' },
  },
};

export const kindLabel = (kind: SpringKind): string => kindTerms[kind].label;

/** Compression spring ends (Machinery's Handbook 31e, Spring Design, Table 3 names the same four). */
export const compressionEndTerms: Record<CompressionEnds, Term> = {
  'closed-ground': term('closed, ground', 'closed and ground'),
  closed: term('closed', 'closed, not ground'),
  'open-ground': term('open, ground', 'open and ground'),
  open: term('open', 'open, not ground'),
};

/** Extension spring end forms (EN 13906-2 Annex A names the same families). */
export const extensionEndTerms: Record<ExtensionEndForm, Term> = {
  'machine-loop': term('machine loop'),
  'full-loop': term('full loop'),
  'crossover-loop': term('crossover loop'),
  'side-loop': term('side loop'),
  'extended-hook': term('extended hook'),
};

export const legFormTerms: Record<LegForm, Term> = {
  tangent: term('straight, tangent', 'tangent'),
  radial: term('straight, radial', 'radial'),
  hooked: term('hooked'),
};

export type Wind = 'right' | 'left' | 'either';

/** Direction of wind (hand of the helix). */
export const windTerms: Record<Wind, Term> = {
  right: term('right-hand'),
  left: term('left-hand'),
  either: term('either', 'either (maker\'s choice)'),
};

export const loadDirectionTerms: Record<'closing' | 'opening', Term> = {
  closing: term('closing (winds up)', 'closing (winds the body up)'),
  opening: term('opening (unwinds)', 'opening (unwinds the body)'),
};

/** Buckling end conditions with EN 13906-1's seating coefficient ν. */
export const seatingTerms: Record<Seating, Term> = {
  'both-fixed': term('Both ends on parallel plates (ν 0.5)'),
  'fixed-hinged': term('One plate, one pivot (ν 0.7)'),
  'both-hinged': term('Both ends pivoting (ν 1)'),
  'fixed-free': term('One end free (ν 2)'),
};

/**
 * Symbols of EN 13906-1/-2/-3 (and ISO 2162-2 on drawings). EN 13906-2 writes the largest permissible
 * length and force of an extension spring Ln and Fn; EN 13906-1 writes the shortest working length of a
 * compression spring Ln.
 */
export const symbols = {
  wireDiameter: 'd',
  meanDiameter: 'D',
  outerDiameter: 'De',
  innerDiameter: 'Di',
  freeLength: 'L0',
  solidLength: 'Ls',
  solidForce: 'Fs',
  minimumWorkingLength: 'Ln',
  maximumSafeLength: 'Ln',
  maximumSafeForce: 'Fn',
  bodyLength: 'Lk',
  initialTension: 'F0',
  activeCoils: 'n',
  totalCoils: 'nt',
  bodyCoils: 'Nb',
  rate: 'R',
  springIndex: 'w',
  pitch: 'p',
  naturalFrequency: 'fe',
  bucklingDeflection: 'sk',
  storedEnergy: 'W',
  tensileStrength: 'Rm',
  /** Test point n along the axis, its force, a working angle, its torque (n counts from 1). */
  length: (n: number) => `L${n}`,
  force: (n: number) => `F${n}`,
  angle: (n: number) => `α${n}`,
  torque: (n: number) => `M${n}`,
} as const;

/** Captions the screens and the documents share. */
export const captions = {
  springDrawing: 'Spring drawing (dimensions at free position)',
  stressChart: 'Stress against allowable',
} as const;
