/** SVG figures and logos placed in the flow with svg-to-pdfkit, their aspect ratio kept. */
import SVGtoPDF from 'svg-to-pdfkit';
import type { FigureModel } from '../../core/documents';
import { cleanLogoSvg } from '../../core/documents';
import type { Doc } from './layout';
import { contentWidth, ensureSpace, leftEdge, put } from './layout';
import { colour, gap, size } from './style';

const CAPTION = 12;

/** Images only from embedded PNG/JPEG data: the writer never opens a file or address an SVG names. */
const embeddedOnly = (link: string): string => (/^data:image\/(png|jpeg);base64,/.test(link) ? link : '');

export function drawSvg(doc: Doc, svg: string, x: number, y: number, width: number, height: number): void {
  SVGtoPDF(doc, svg, x, y, {
    width, height, preserveAspectRatio: 'xMidYMid meet', imageCallback: embeddedOnly, documentCallback: () => [],
  });
}

/** The figure as large as fits `maxWidth` × `maxHeight` (never enlarged), centred, caption below. */
export function figure(doc: Doc, f: FigureModel, maxWidth = contentWidth(doc), maxHeight = Infinity): void {
  const scale = Math.min(1, maxWidth / f.width, maxHeight / f.height);
  const w = f.width * scale;
  const h = f.height * scale;
  ensureSpace(doc, h + CAPTION);
  const x = leftEdge(doc) + (contentWidth(doc) - w) / 2;
  const y = doc.y;
  drawSvg(doc, f.svg, x, y, w, h);
  doc.rect(x, y, w, h).lineWidth(0.4).strokeColor(colour.rule).stroke();
  put(doc, f.caption, x, y + h + 2, w, { pt: size.small, fill: colour.muted, align: 'center' });
  doc.y = y + h + CAPTION + gap.block;
}

const DATA_URL = /^data:image\/(png|jpeg|svg\+xml);base64,(.*)$/s;

/**
 * The shop's logo from its data URL, fitted into the box. A logo pdfkit cannot read is left out: the
 * document still prints, and the settings screen is where a bad logo is reported.
 */
export function drawLogo(doc: Doc, dataUrl: string, x: number, y: number, width: number, height: number): boolean {
  const m = DATA_URL.exec(dataUrl);
  if (!m) return false;
  const bytes = Buffer.from(m[2]!, 'base64');
  try {
    if (m[1] === 'svg+xml') {
      const svg = cleanLogoSvg(bytes.toString('utf8'));
      if (svg === null) return false;
      drawSvg(doc, svg, x, y, width, height);
    } else doc.image(bytes, x, y, { fit: [width, height] });
    return true;
  } catch {
    return false;
  }
}
