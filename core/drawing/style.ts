/**
 * Line weights follow the ISO 128 pairing of thick visible outlines and thin dimension, extension and
 * centre lines (ratio 2 : 1), at a size that reads on screen and on an A4 page.
 */
export const ink = '#1a1a1a';
export const paper = '#ffffff';
export const gridColour = '#dcdcdc';
export const mutedInk = '#6b6b6b';

/** Series colours for diagrams; distinct in greyscale print as well (dark, mid, light). */
export const seriesColours = { primary: '#1f4e8c', secondary: '#b5481b', tertiary: '#4f7f3a' } as const;

export const lineWeight = { thick: 1.2, thin: 0.6 } as const;

/** ISO 128 line types as dash arrays, in px. */
export const dash = { chain: '14 3 2 3', dashed: '6 3', dotted: '1.5 2.5' } as const;

/** One of the PDF standard fonts, so pdfkit needs no embedded font to set the drawing's text. */
export const fontFamily = 'Helvetica';

export const fontSize = { label: 9, small: 8, title: 10 } as const;

export const arrowSize = { length: 7, width: 2.6 } as const;
