/** The shop traveller as a PDF, drawn from its document model alone (plus the embedded fonts). */
import type { TravellerDocument } from '../../core/documents';
import { figure } from './figure';
import type { Doc } from './layout';
import {
  contentWidth, ensureSpace, heading, leftEdge, pageRoom, paragraphs, paragraphsHeight, put, space,
} from './layout';
import { fieldGrid } from './grid';
import { FONT } from './fonts';
import { FILL_IN_HEIGHT, fillInBoxes, notice } from './boxes';
import { documentHeader } from './letterhead';
import { operationBlock, operationHeight } from './operation-block';
import { finish, openDocument } from './page';
import { drawQr } from './qr';
import { colour, gap, size } from './style';
import { drawTable, tableHeight } from './table';

const QR_SIDE = 62;

function header(doc: Doc, m: TravellerDocument): void {
  const top = doc.y;
  const keep = new Set(['Job', 'Due date']);
  documentHeader(doc, m.letterhead, {
    title: m.title, fields: m.job.fields.filter((f) => keep.has(f.label)), reserveRight: m.qr ? QR_SIDE + 8 : 0,
  });
  if (!m.qr) return;
  const x = leftEdge(doc) + contentWidth(doc) - QR_SIDE;
  drawQr(doc, m.qr, x, top - 4, QR_SIDE);
  const after = doc.y;
  put(doc, m.qr, x, top + QR_SIDE - 6, QR_SIDE, { pt: size.small - 1, align: 'center', fill: colour.muted });
  doc.y = after;
}

function findings(doc: Doc, m: TravellerDocument): void {
  if (m.findings.length === 0) return;
  notice(doc, { title: 'Open review findings: resolve before release', paragraphs: m.findings });
}

function material(doc: Doc, m: TravellerDocument): void {
  heading(doc, 'Material', 90);
  fieldGrid(doc, m.material.fields, { columns: 2 });
  space(doc, gap.heading);
  fillInBoxes(doc, m.material.fillIn);
  space(doc);
}

function routing(doc: Doc, m: TravellerDocument): void {
  const first = m.operations[0];
  heading(doc, 'Routing', first ? operationHeight(doc, first) : 40);
  for (const op of m.operations) operationBlock(doc, op);
  space(doc, gap.heading);
}

const INSPECTION_TABLE = { pt: size.body - 0.5, minRowHeight: 20 };

/** The sampling plan, the table and the inspector's sign-off, on one page whenever they fit on one. */
function inspection(doc: Doc, m: TravellerDocument): void {
  const summary = m.inspection.summary;
  const finishRows = m.inspection.finish.length > 0 ? FILL_IN_HEIGHT + 13 + gap.heading : 0;
  const height = paragraphsHeight(doc, summary, contentWidth(doc)) + tableHeight(doc, m.inspection.table, INSPECTION_TABLE)
    + FILL_IN_HEIGHT + finishRows + 2 * gap.heading;
  heading(doc, 'Inspection', Math.min(height, pageRoom(doc) - 40));
  paragraphs(doc, summary.slice(0, -1));
  paragraphs(doc, summary.slice(-1), { pt: size.small, fill: colour.muted });
  space(doc, gap.heading);
  drawTable(doc, m.inspection.table, INSPECTION_TABLE);
  space(doc, gap.heading);
  if (m.inspection.finish.length > 0) {
    put(doc, 'Finish inspection', leftEdge(doc), doc.y, contentWidth(doc), { font: FONT.bold });
    doc.y += 13;
    fillInBoxes(doc, m.inspection.finish);
    space(doc, gap.heading);
  }
  fillInBoxes(doc, m.inspection.signOff);
  space(doc);
}

/** First-article approval and engineering release: signed before the run goes on. */
function release(doc: Doc, m: TravellerDocument): void {
  heading(doc, 'Release to production', FILL_IN_HEIGHT + 20);
  fillInBoxes(doc, m.release);
  space(doc);
}

const DRAWING_HEIGHT = 320;

/** The figures at a size the setter and the inspector can read: the drawing never shrinks to fit. */
function figures(doc: Doc, m: TravellerDocument): void {
  if (m.figures.length === 0) return;
  heading(doc, 'Drawing and diagram', DRAWING_HEIGHT + 20);
  const [drawing, ...rest] = m.figures;
  figure(doc, drawing!, contentWidth(doc), DRAWING_HEIGHT);
  for (const f of rest) figure(doc, f, contentWidth(doc) * 0.8, 260);
}

export async function renderTraveller(m: TravellerDocument): Promise<Buffer> {
  const open = openDocument(m);
  const { doc } = open;
  header(doc, m);
  heading(doc, 'Job');
  fieldGrid(doc, m.job.fields, { columns: 2 });
  space(doc);
  findings(doc, m);
  material(doc, m);
  heading(doc, 'Safety', 60);
  paragraphs(doc, m.safety, { bullet: true });
  space(doc);
  release(doc, m);
  routing(doc, m);
  inspection(doc, m);
  figures(doc, m);
  ensureSpace(doc, 80);
  notice(doc, m.caution);
  return finish(open, m);
}
