/**
 * Shape checks for a document model read back from the store: a quote snapshot written by an older or a
 * damaged build is refused with the field named, never half-printed.
 */
import { z } from 'zod';
import type { Result } from '../result';
import { fail, fieldError, formatPath, ok } from '../result';
import type { QuoteDocument } from './types';
import { DOCUMENT_VERSION } from './types';

const field = z.object({ label: z.string(), value: z.string() });
const table = z.object({
  columns: z.array(z.object({ header: z.string(), weight: z.number().positive(), align: z.enum(['left', 'right', 'center']) })),
  rows: z.array(z.array(z.string())),
});
const figure = z.object({ caption: z.string(), svg: z.string(), width: z.number().positive(), height: z.number().positive() });

const common = {
  version: z.literal(DOCUMENT_VERSION),
  paperSize: z.enum(['letter', 'a4']),
  createdAt: z.string().refine((s) => !Number.isNaN(Date.parse(s)), 'an ISO timestamp'),
  title: z.string(),
  reference: z.string(),
  letterhead: z.object({ name: z.string(), addressLines: z.array(z.string()), contact: z.array(z.string()), logo: z.string().nullable() }),
  caution: z.object({ title: z.string(), paragraphs: z.array(z.string()).min(1) }),
};

const lineContent = {
  part: z.array(field),
  specification: z.object({ heading: z.string(), fields: z.array(field) }),
  drawing: figure.nullable(),
  prices: z.object({ currency: z.string(), table, notes: z.array(z.string()) }),
  exceptions: z.array(z.string()).default([]),
  leadTime: z.string(),
  priceCurve: figure.nullable().default(null),
};

const quoteHead = {
  ...common,
  type: z.literal('quote'),
  issue: z.object({ number: z.string(), date: z.string(), validUntil: z.string(), validityDays: z.number().int().positive() }),
  customer: z.object({ name: z.string(), lines: z.array(z.string()) }),
  commercial: z.array(field).default([]),
  terms: z.array(z.string()),
  signature: z.object({ preparedBy: z.string(), boxes: z.array(z.string()) }).nullable().default(null),
};

const quotationSchema = z.object({
  ...quoteHead,
  overview: z.array(field),
  items: table.nullable(),
  lines: z.array(z.object({ item: z.string(), title: z.string(), ...lineContent })).min(1),
});

/**
 * A quote issued before quotations had lines kept its one part at the top level; it reads as a one-line
 * quotation whose page is drawn exactly as it was.
 */
const oneJobQuoteSchema = z.object({ ...quoteHead, ...lineContent }).transform((q): QuoteDocument => {
  const { part, specification, drawing, prices, exceptions, leadTime, priceCurve, ...head } = q;
  return { ...head, overview: part, items: null,
    lines: [{ item: '1', title: 'Item 1', part, specification, drawing, prices, exceptions, leadTime, priceCurve }] };
});

const quoteSchema: z.ZodType<QuoteDocument, unknown> = z.unknown().transform((raw, ctx) => {
  const shape = typeof raw === 'object' && raw !== null && 'lines' in raw ? quotationSchema : oneJobQuoteSchema;
  const parsed = shape.safeParse(raw);
  if (parsed.success) return parsed.data as QuoteDocument;
  for (const issue of parsed.error.issues) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
  return z.NEVER;
});

export function parseQuoteDocument(raw: unknown): Result<QuoteDocument> {
  const parsed = quoteSchema.safeParse(raw);
  if (parsed.success) return ok(parsed.data);
  return fail(parsed.error.issues.map((i) => fieldError('invalid-document', formatPath(['document', ...i.path]), i.message)));
}

export const isQuoteDocument = (raw: unknown): raw is QuoteDocument => quoteSchema.safeParse(raw).success;
