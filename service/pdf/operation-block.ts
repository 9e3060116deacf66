/** One operation of the routing as a framed block: what, where, how fast, the settings, and the sign-off. */
import type { OperationModel } from '../../core/documents';
import { FONT } from './fonts';
import type { Doc } from './layout';
import { contentWidth, ensureSpace, leftEdge, paragraphs, paragraphsHeight, put, textHeight } from './layout';
import { fieldGrid, fieldGridHeight, gridValueWidth } from './grid';
import { FILL_IN_HEIGHT, fillInBoxes } from './boxes';
import { colour, gap, size } from './style';

const PAD = 5;
const BAND = 16;
const SHORT = { columns: 3, labelShare: 0.5 };
const LONG = { columns: 1, labelShare: 0.22 };

/** Settings whose value fits one line of a third of the width go side by side; the rest full width. */
function settingGroups(doc: Doc, op: OperationModel, inner: number) {
  const valueWidth = gridValueWidth(doc, { ...SHORT, width: inner });
  doc.font(FONT.bold).fontSize(size.body);
  const short = op.settings.filter((f) => doc.widthOfString(f.value) < valueWidth - 1);
  return { short, long: op.settings.filter((f) => !short.includes(f)) };
}

const paceLine = (op: OperationModel): string => op.fields.map((f) => `${f.label} ${f.value}`).join('   ·   ');

function parts(doc: Doc, op: OperationModel, inner: number) {
  return {
    pace: op.fields.length > 0 ? textHeight(doc, paceLine(op), inner, FONT.body, size.small) + gap.line : 0,
    settings: fieldGridHeight(doc, settingGroups(doc, op, inner).short, { ...SHORT, width: inner })
      + fieldGridHeight(doc, settingGroups(doc, op, inner).long, { ...LONG, width: inner }),
    notes: op.notes.length > 0 ? gap.line + paragraphsHeight(doc, op.notes, inner, { pt: size.small, bullet: true }) : 0,
  };
}

export function operationHeight(doc: Doc, op: OperationModel): number {
  const p = parts(doc, op, contentWidth(doc) - 2 * PAD);
  return BAND + PAD + p.pace + p.settings + p.notes + gap.heading + FILL_IN_HEIGHT + PAD;
}

function band(doc: Doc, op: OperationModel, x: number, y: number, width: number): void {
  doc.rect(x, y, width, BAND).fill(op.outside ? '#f6efe6' : colour.shade);
  put(doc, `${op.sequence}   ${op.title}`, x + PAD, y + 3.5, width * 0.6, { font: FONT.bold });
  put(doc, op.workCentre, x + width * 0.5, y + 4, width * 0.5 - PAD, { pt: size.small, fill: colour.muted, align: 'right' });
}

/** Draws the block whole: it moves to the next page first when it would not fit. */
export function operationBlock(doc: Doc, op: OperationModel): void {
  const height = operationHeight(doc, op);
  ensureSpace(doc, height);
  const x = leftEdge(doc);
  const width = contentWidth(doc);
  const inner = width - 2 * PAD;
  const y = doc.y;
  band(doc, op, x, y, width);
  doc.y = y + BAND + PAD;
  if (op.fields.length > 0) {
    doc.y += put(doc, paceLine(op), x + PAD, doc.y, inner, { pt: size.small }) + gap.line;
  }
  const groups = settingGroups(doc, op, inner);
  fieldGrid(doc, groups.short, { ...SHORT, x: x + PAD, width: inner });
  fieldGrid(doc, groups.long, { ...LONG, x: x + PAD, width: inner });
  if (op.notes.length > 0) {
    doc.y += gap.line;
    paragraphs(doc, op.notes, { pt: size.small, bullet: true, fill: colour.muted }, x + PAD, inner);
  }
  doc.y += gap.heading;
  fillInBoxes(doc, op.signOff, x + PAD, inner);
  doc.rect(x, y, width, height).lineWidth(0.8).strokeColor(colour.box).stroke();
  doc.y = y + height + gap.block * 0.75;
}
