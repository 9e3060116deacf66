/** Reading SVG drawings back in tests: a minimal XML reader and chart-axis readers. */
import { expect } from 'vitest';

// ---- a minimal XML reader: fails on unbalanced tags, stray '<' or '&', bad attributes --------------

export interface Node {
  name: string;
  attrs: Record<string, string>;
  children: Node[];
  text: string;
}

const entities: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

function decode(raw: string): string {
  return raw.replace(/&([^;&<]*);?/g, (whole, name: string) => {
    if (!whole.endsWith(';')) throw new Error(`bare '&' in "${raw}"`);
    if (/^#\d+$/.test(name)) return String.fromCodePoint(Number(name.slice(1)));
    if (/^#x[0-9a-f]+$/i.test(name)) return String.fromCodePoint(parseInt(name.slice(2), 16));
    const value = entities[name];
    if (value === undefined) throw new Error(`unknown entity &${name};`);
    return value;
  });
}

function parseAttrs(source: string): Record<string, string> {
  const attrs: Record<string, string> = {};
  const rest = source.replace(/\s+([A-Za-z_][\w:.-]*)="([^"<]*)"/g, (_w, key: string, value: string) => {
    if (key in attrs) throw new Error(`duplicate attribute ${key}`);
    attrs[key] = decode(value);
    return '';
  });
  if (rest.trim() !== '') throw new Error(`malformed attributes: ${rest}`);
  return attrs;
}

export function parseXml(xml: string): Node {
  const root: Node = { name: '#document', attrs: {}, children: [], text: '' };
  const stack = [root];
  const token = /<\/([A-Za-z][\w:.-]*)\s*>|<([A-Za-z][\w:.-]*)((?:\s+[^\s=/>]+="[^"]*")*)\s*(\/?)>|([^<]+)/y;
  while (token.lastIndex < xml.length) {
    const at = token.lastIndex;
    const m = token.exec(xml);
    if (!m) throw new Error(`unexpected markup at ${at}: ${xml.slice(at, at + 40)}`);
    const top = stack[stack.length - 1] as Node;
    if (m[1]) {
      if (top.name !== m[1]) throw new Error(`</${m[1]}> closes <${top.name}>`);
      stack.pop();
    } else if (m[2]) {
      const node: Node = { name: m[2], attrs: parseAttrs(m[3] ?? ''), children: [], text: '' };
      top.children.push(node);
      if (!m[4]) stack.push(node);
    } else {
      if (top === root && (m[5] ?? '').trim() !== '') throw new Error('text outside the root element');
      top.text += decode(m[5] ?? '');
    }
  }
  if (stack.length !== 1) throw new Error(`unclosed <${stack[stack.length - 1]?.name}>`);
  if (root.children.length !== 1) throw new Error('a document has exactly one root element');
  return root.children[0] as Node;
}

export const all = (node: Node, test: (n: Node) => boolean): Node[] =>
  [...(test(node) ? [node] : []), ...node.children.flatMap((c) => all(c, test))];
export const part = (node: Node, name: string): Node[] => all(node, (n) => n.attrs['data-part'] === name);
export const only = (node: Node, name: string): Node => {
  const found = part(node, name);
  expect(found, `one group data-part="${name}"`).toHaveLength(1);
  return found[0] as Node;
};
export const texts = (node: Node): string[] => all(node, (n) => n.name === 'text').map((n) => n.text);
export const attr = (node: Node, key: string): number => Number(node.attrs[key]);
export const pointList = (node: Node) => (node.attrs.points ?? '').split(' ').map((p) => p.split(',').map(Number) as [number, number]);

// ---- reading a chart back through its own axes ----------------------------------------------------

export interface Axis { values: number[]; positions: number[]; toData(px: number): number }

export function readAxis(chart: Node, which: 'x' | 'y'): Axis {
  const group = only(chart, `${which}-ticks`);
  const marks = group.children.filter((n) => n.name === 'line' && (which === 'x'
    ? attr(n, 'y2') - attr(n, 'y1') === 4 : attr(n, 'x2') - attr(n, 'x1') === 4));
  const positions = marks.map((n) => attr(n, which === 'x' ? 'x1' : 'y1'));
  const values = group.children.filter((n) => n.name === 'text').map((n) => Number(n.text));
  expect(values).toHaveLength(positions.length);
  const [v0, v1] = [values[0] as number, values[values.length - 1] as number];
  const [p0, p1] = [positions[0] as number, positions[positions.length - 1] as number];
  return { values, positions, toData: (px) => v0 + ((px - p0) / (p1 - p0)) * (v1 - v0) };
}

