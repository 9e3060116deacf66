/** Type sizes (pt) and colours shared by every document. */
export const size = { title: 17, heading: 10.5, body: 8.5, small: 7, name: 13 } as const;

export const colour = {
  ink: '#1a1a1a',
  muted: '#5a5a5a',
  rule: '#9a9a9a',
  box: '#6b6b6b',
  shade: '#eef1f5',
  accent: '#1f4e8c',
  warning: '#8a1c1c',
} as const;

/** Space between blocks and between a heading and its content. */
export const gap = { block: 12, heading: 5, line: 3 } as const;
