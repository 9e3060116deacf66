/**
 * Printed documents as plain data: every text already formatted in the job's units, every figure an SVG
 * string. A PDF writer draws a model and nothing else, so a model kept with an issued quote prints the same
 * document years later, whatever has changed in the shop's prices or in the engine since.
 */
import type { QuantityMap } from '../units';

export type PaperSize = 'letter' | 'a4';

export const DOCUMENT_VERSION = 1;

/** A label and its value, both ready to print. */
export interface Field {
  label: string;
  value: string;
}

export interface Column {
  header: string;
  /** Share of the table's width, relative to the other columns. */
  weight: number;
  align: 'left' | 'right' | 'center';
}

export interface TableModel {
  columns: Column[];
  /** One string per column. */
  rows: string[][];
}

/** An SVG figure; width and height are its natural size, whose aspect ratio the page keeps. */
export interface FigureModel {
  caption: string;
  svg: string;
  width: number;
  height: number;
}

export interface NoticeModel {
  title: string;
  paragraphs: string[];
}

export interface Letterhead {
  name: string;
  addressLines: string[];
  /** Phone and e-mail, each already labelled. */
  contact: string[];
  /** A PNG, JPEG or SVG data URL, or null. */
  logo: string | null;
}

export interface DocumentCommon {
  version: typeof DOCUMENT_VERSION;
  paperSize: PaperSize;
  /** ISO timestamp of issue or print; also the PDF's creation date, so one model always gives one file. */
  createdAt: string;
  /** "Quotation", "Shop traveller". */
  title: string;
  /** What the footer of every page names beside "Page X of Y", e.g. "Quotation Q-26-0004". */
  reference: string;
  letterhead: Letterhead;
  caution: NoticeModel;
}

export interface QuoteIssue {
  /** The quote number, or "DRAFT" until the store issues it. */
  number: string;
  date: string;
  validUntil: string;
  validityDays: number;
}

/** Who signs a document, and the boxes left for the signature. */
export interface SignatureBlock {
  /** "J. Demo, estimator". */
  preparedBy: string;
  boxes: string[];
}

/** One line item of a quotation: one job's part, spring, prices, accepted deviations and lead time. */
export interface QuoteLineModel {
  /** "1", "2", …: how the customer refers to the line. */
  item: string;
  /** "Item 2: FG-101", the heading of the line on a quotation of several. */
  title: string;
  /** Part number, drawing and our job. */
  part: Field[];
  specification: { heading: string; fields: Field[] };
  drawing: FigureModel | null;
  /** The line's quantity breaks and its one-off charges. */
  prices: { currency: string; table: TableModel; notes: string[] };
  /** Engineering exceptions the shop accepted on this line, in the customer's words. */
  exceptions: string[];
  leadTime: string;
  /** Unit price against quantity, when the shop prints it on quotes. */
  priceCurve: FigureModel | null;
}

/**
 * A quotation for one customer: one or several line items, each a job with its own breaks and charges,
 * under one number, one validity and one set of terms.
 */
export interface QuoteDocument extends DocumentCommon {
  type: 'quote';
  issue: QuoteIssue;
  customer: { name: string; lines: string[] };
  /** Printed beside the customer: the part of a one-line quotation, or what several lines cover. */
  overview: Field[];
  /** The lines at a glance (several lines only); null for a one-line quotation. */
  items: TableModel | null;
  lines: QuoteLineModel[];
  /** Payment, delivery, packaging and certificates as offered on this quotation. */
  commercial: Field[];
  terms: string[];
  signature: SignatureBlock | null;
}

/** One operation of the routing as the shop floor reads it, with the boxes the operator fills in. */
export interface OperationModel {
  sequence: string;
  title: string;
  workCentre: string;
  outside: boolean;
  /** Setup, run rate or batches, scrap allowance. */
  fields: Field[];
  settings: Field[];
  notes: string[];
  signOff: string[];
}

export interface TravellerDocument extends DocumentCommon {
  type: 'traveller';
  job: { number: string | null; fields: Field[] };
  /** The text of the QR code (the job number), or null for a job not in the store. */
  qr: string | null;
  material: { fields: Field[]; fillIn: string[] };
  /** First-article approval and engineering release, signed before the run goes on. */
  release: string[];
  operations: OperationModel[];
  /** `finish`: what the inspector records of the finish (none when no finish is applied). */
  inspection: { summary: string[]; table: TableModel; finish: string[]; signOff: string[] };
  figures: FigureModel[];
  safety: string[];
  /** Review findings still open (errors and warnings), printed so nobody misses them on the floor. */
  findings: string[];
}

export type PrintedDocument = QuoteDocument | TravellerDocument;

const figureQuantities: QuantityMap = { width: 'figure', height: 'figure' };
const tableQuantities: QuantityMap = { columns: { weight: 'ratio' } };

/**
 * What the few numbers of a document model measure; everything else in a model is text, formatted in the
 * job's units before it gets here.
 */
export const documentQuantities: QuantityMap = {
  version: 'ordinal',
  issue: { validityDays: 'days' },
  lines: { drawing: figureQuantities, priceCurve: figureQuantities, prices: { table: tableQuantities } },
  items: tableQuantities,
  figures: figureQuantities,
  inspection: { table: tableQuantities },
};
