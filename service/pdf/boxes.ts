/** Framed blocks: the notices (cautions, open findings) and the boxes the floor writes in. */
import type { NoticeModel } from '../../core/documents';
import { FONT } from './fonts';
import type { Doc } from './layout';
import { contentWidth, ensureSpace, heading, leftEdge, pageRoom, paragraphs, paragraphsHeight, put, textHeight } from './layout';
import { colour, gap, size } from './style';

const NOTICE_PAD = 7;

/** A framed notice, kept whole on one page: the cautions. One longer than a page runs on unframed. */
export function notice(doc: Doc, n: NoticeModel, tone: string = colour.warning): void {
  const width = contentWidth(doc) - 2 * NOTICE_PAD;
  const titleH = textHeight(doc, n.title, width, FONT.bold, size.heading);
  const h = titleH + gap.heading + paragraphsHeight(doc, n.paragraphs, width) + 2 * NOTICE_PAD;
  if (h > pageRoom(doc)) {
    heading(doc, n.title);
    paragraphs(doc, n.paragraphs);
    return;
  }
  ensureSpace(doc, h);
  const x = leftEdge(doc);
  const y = doc.y;
  doc.rect(x, y, contentWidth(doc), h).lineWidth(1).strokeColor(tone).stroke();
  put(doc, n.title, x + NOTICE_PAD, y + NOTICE_PAD, width, { font: FONT.bold, pt: size.heading, fill: tone });
  doc.y = y + NOTICE_PAD + titleH + gap.heading;
  paragraphs(doc, n.paragraphs, {}, x + NOTICE_PAD, width);
  doc.y = y + h + gap.block;
}

export const FILL_IN_HEIGHT = 26;

/** A row of empty boxes, each with its caption, for the floor to write in. */
export function fillInBoxes(doc: Doc, labels: readonly string[], x = leftEdge(doc), width = contentWidth(doc), height = FILL_IN_HEIGHT): void {
  ensureSpace(doc, height);
  const y = doc.y;
  const w = width / labels.length;
  labels.forEach((label, i) => {
    doc.rect(x + i * w, y, w, height).lineWidth(0.6).strokeColor(colour.box).stroke();
    put(doc, label, x + i * w + 3, y + 2, w - 6, { pt: size.small, fill: colour.muted });
  });
  doc.y = y + height;
}
