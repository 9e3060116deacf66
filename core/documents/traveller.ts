/** The shop traveller: what to make, from which wire, in which operations, what to check, and who signed. */
import { kindTerms } from '../vocabulary';
import type { JobJudgement } from '../quoting/judgement';
import type { Finding } from '../result';
import { planManufacture } from '../process/plan';
import type { ManufacturingPlan } from '../process/plan';
import type { Settings } from '../settings/schema';
import type { Spec } from '../spec';
import { cautionNotice, planSafetyNotes } from './cautions';
import { drawingText, kindTitle, letterhead, present } from './common';
import { springContent } from './spring';
import { piecesText } from './text';
import { calendarDay } from '../calendar';
import {
  INSPECTION_SIGN_OFF, MATERIAL_FILL_IN, RELEASE_SIGN_OFF, finishChecks, inspectionTable, materialFields, operationLots,
  operationModel, samplingSummary,
} from './traveller-sections';
import { effectiveFinish } from '../finishing/effective';
import { goodmanDiagram } from '../drawing';
import type { SpringReport } from '../calculate';
import type { Field, FigureModel, TravellerDocument } from './types';
import { DOCUMENT_VERSION } from './types';

export interface TravellerJob {
  /** The shop's job number (also the QR code), or null for a spring not in the store. */
  number: string | null;
  customerName: string | null;
  partNumber: string;
  drawingNumber: string;
  drawingRevision: string;
  purchaseOrder?: string;
  orderQuantity: number;
  /** The estimator's routing overrides: the floor works to them, each shown with the shop's figure. */
  judgement?: JobJudgement;
  dueDate: string | null;
}

export interface TravellerInput {
  spec: Spec;
  settings: Settings;
  job: TravellerJob;
  /** ISO timestamp of printing. */
  printedAt: string;
}

function jobFields(job: TravellerJob, plan: ManufacturingPlan, printed: string): Field[] {
  return present([
    { label: 'Job', value: job.number ?? 'not in the job store' },
    { label: 'Part number', value: job.partNumber },
    { label: 'Drawing', value: drawingText(job.drawingNumber, job.drawingRevision) },
    { label: 'Customer', value: job.customerName ?? '' },
    { label: 'Customer order no.', value: job.purchaseOrder || 'not given' },
    { label: 'Quantity ordered', value: `${piecesText(job.orderQuantity)} pcs` },
    { label: 'Quantity to start', value: `${piecesText(plan.lotWire.startQuantity)} pcs (with scrap allowance)` },
    { label: 'Due date', value: job.dueDate ?? 'not set' },
    { label: kindTerms[plan.kind].toleranceGrade, value: String(plan.toleranceGrade) },
    { label: 'Printed', value: printed },
  ]);
}

function findingLines(findings: readonly Finding[]): string[] {
  return findings
    .filter((f) => f.severity === 'error' || f.severity === 'warning')
    .map((f) => `${f.severity === 'error' ? 'ERROR' : 'Warning'}: ${f.message}${f.fix ? ` (${f.fix})` : ''}`);
}

const GOODMAN = { width: 480, height: 300 };

/** Cyclic duty: the fatigue diagram, so the floor sees how near the operating point sits to the lines. */
function fatigueFigure(report: SpringReport): FigureModel[] {
  const svg = report.kind === 'compression' ? goodmanDiagram(report, GOODMAN) : null;
  return svg ? [{ caption: 'Fatigue diagram (Goodman and Gerber lines, cyclic duty)', svg, ...GOODMAN }] : [];
}

export function travellerDocument(input: TravellerInput): TravellerDocument {
  const { spec, settings, job } = input;
  const plan = planManufacture(spec, settings, job.orderQuantity, job.judgement);
  const spring = springContent(spec, settings, job.partNumber || kindTitle(spec.kind));
  const lots = operationLots(plan);
  return {
    version: DOCUMENT_VERSION, type: 'traveller', paperSize: settings.defaults.paperSize, createdAt: input.printedAt,
    title: 'Shop traveller', reference: `Traveller, job ${job.number ?? '(not stored)'}`,
    letterhead: letterhead(settings), caution: cautionNotice('shop'),
    job: { number: job.number, fields: jobFields(job, plan, calendarDay(input.printedAt, settings.defaults.timeZone)) },
    qr: job.number,
    material: { fields: materialFields(plan), fillIn: MATERIAL_FILL_IN },
    release: RELEASE_SIGN_OFF,
    operations: plan.operations.map((op, i) => operationModel(op, plan.units, lots[i]!)),
    inspection: {
      summary: samplingSummary(plan.inspection), table: inspectionTable(plan.inspection, plan.units),
      finish: finishChecks(effectiveFinish(spec, settings.finishes).finish), signOff: INSPECTION_SIGN_OFF,
    },
    figures: [spring.drawing, spring.diagram, ...fatigueFigure(spring.report)],
    safety: planSafetyNotes(plan, spec, settings.finishes),
    findings: findingLines(plan.findings),
  };
}
