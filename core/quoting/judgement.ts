/**
 * The estimator's judgement on one job, kept with it: routing overrides (pin a machine, set-up, run rate,
 * scrap, remove an operation, add one from the shop's list) and price overrides (margin, unit price at a
 * break, one-off charges). Every override carries a short reason; the plan and the cost show the shop's
 * default beside it.
 */
import { z } from 'zod';

const reason = z.string().trim().min(3, 'give a short reason').max(200);
const key = z.string().trim().min(1).max(60);

export const routingOverrideSchema = z.object({
  /** The operation's key in the routing ("grind", "coil", "load-test#2"). */
  operation: key,
  machine: z.string().trim().min(1).max(40).optional(),
  setupMinutes: z.number().finite().min(0).max(10_000).optional(),
  piecesPerHour: z.number().finite().positive().max(1_000_000).optional(),
  scrapPercent: z.number().finite().min(0).max(50).optional(),
  remove: z.literal(true).optional(),
  reason,
}).strict();

export const addedOperationSchema = z.object({
  /** An id from the shop's list of extra operations (Shop settings → Extra operations). */
  operation: key,
  reason,
}).strict();

export const priceJudgementSchema = z.object({
  marginPercent: z.object({ value: z.number().finite().min(0).max(1000), reason }).strict().optional(),
  unitPrices: z.array(z.object({
    quantity: z.number().int().min(1).max(10_000_000),
    unitPrice: z.number().finite().positive().max(1_000_000),
    reason,
  }).strict()).max(24).default([]),
  /** One-off charges (tooling, first-article inspection, set-up, certificates), each printed as its own line. */
  charges: z.array(z.object({
    label: z.string().trim().min(1).max(80),
    amount: z.number().finite().positive().max(10_000_000),
  }).strict()).max(12).default([]),
}).strict();

export const jobJudgementSchema = z.object({
  routing: z.array(routingOverrideSchema).max(40).default([]),
  added: z.array(addedOperationSchema).max(12).default([]),
  price: priceJudgementSchema.default({ unitPrices: [], charges: [] }),
}).strict().superRefine((j, ctx) => {
  const seen = new Set<string>();
  j.routing.forEach((o, i) => {
    if (seen.has(o.operation)) ctx.addIssue({ code: 'custom', path: ['routing', i, 'operation'], message: `operation "${o.operation}" is overridden twice` });
    seen.add(o.operation);
  });
  const breaks = new Set<number>();
  j.price.unitPrices.forEach((p, i) => {
    if (breaks.has(p.quantity)) ctx.addIssue({ code: 'custom', path: ['price', 'unitPrices', i, 'quantity'], message: `the break at ${p.quantity} pcs is set twice` });
    breaks.add(p.quantity);
  });
});

export type JobJudgement = z.output<typeof jobJudgementSchema>;
export type JobJudgementInput = z.input<typeof jobJudgementSchema>;
export type RoutingOverride = z.output<typeof routingOverrideSchema>;

export const noJudgement = (): JobJudgement => ({ routing: [], added: [], price: { unitPrices: [], charges: [] } });
