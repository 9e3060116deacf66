/**
 * What one kind of spring brings to every step, as one entry of the kind registry (./registry.ts). The
 * design type stays inside the entry: each kind's file checks that its design feeds its own analysis,
 * review, routing and inspection; the registry shows only what every design has, the coil body.
 */
import type { z } from 'zod';
import type { Field } from '../documents/types';
import type { SpringDiagramOptions, SpringDrawingOptions } from '../drawing/spring';
import type { InspectionPlan } from '../process/inspection-plan';
import type { ShopTables } from '../tolerances';
import type { RoutingChoices } from '../process/operations';
import type { Operation } from '../process/types';
import type { FieldError, Finding } from '../result';
import type { Settings } from '../settings/schema';
import type { Spec, SpringKind } from '../spec';
import type { CoilBody } from '../springs/coil-body';
import type { CompressionReport } from '../springs/compression/report';
import type { ExtensionReport } from '../springs/extension/report';
import type { TorsionReport } from '../springs/torsion/report';
import type { ToleranceGrade } from '../tolerances';
import type { Quantity, QuantityMap } from '../units';

export type SpringReport = CompressionReport | ExtensionReport | TorsionReport;
export type SpecOf<K extends SpringKind> = Extract<Spec, { kind: K }>;
export type ReportOf<K extends SpringKind> = Extract<SpringReport, { kind: K }>;

/** Methods (not arrow properties) on purpose: the registry holds each kind's design as its coil body. */
export interface KindParts<S, X extends CoilBody, R> {
  schema: z.ZodType<S>;
  /** The checks the schema cannot express; each error names its field. */
  specErrors(spec: S): FieldError[];
  /** What each number of the spec measures; the engine and the form's unit switch convert with it. */
  specQuantities: QuantityMap;
  /** The spec in internal units with its wire resolved; undefined only for an unknown grade. */
  design(spec: S): X | undefined;
  /** The shop's settings choose between methods where the kind has a choice (compression: set removal). */
  analyse(design: X, settings?: Settings): R;
  /** The maker's review; the shop's settings supply the shop's own tables where a rule reads one. */
  review(design: X, report: R, settings?: Settings): Finding[];
  /** What each number of the report measures; reports convert out to the job's units with it. */
  reportQuantities: QuantityMap;
  routing(settings: Settings, design: X, report: R, choices: RoutingChoices): Operation[];
  /** `tables`: the shop's own tolerance tables (Settings → Tolerances). */
  inspection(design: X, report: R, lotSize: number, aql: number, grade: ToleranceGrade, findings: Finding[], tables: ShopTables): InspectionPlan;
  /** The free length the coiler makes and the finished one; null where the kind has none (torsion). */
  freeLengths(report: R): { coiled: number | null; finished: number | null };
  drawing(report: R, options: SpringDrawingOptions): string;
  diagram(report: R, options: SpringDiagramOptions): string;
  /** What the drawing takes from the spec rather than the report. */
  drawingOptions(spec: S): SpringDrawingOptions;
  document: {
    heading: string;
    diagramCaption: string;
    fields(spec: S, report: R, settings: Settings): Field[];
  };
  /** The length and rate similar-job search and the job list compare this kind on (internal units). */
  shape: {
    length(report: R): number;
    rate(report: R): number;
    rateQuantity: Quantity;
    /** What the length is when it is not the free length (torsion: "body"); null otherwise. */
    lengthNote: string | null;
  };
}

/** One kind's entry; its design type is the kind's own business. */
export type KindEntry<K extends SpringKind> = KindParts<SpecOf<K>, CoilBody, ReportOf<K>>;

/** Builds one kind's entry, checking that its design, analysis and plan steps agree on their types. */
export const kindEntry = <S, X extends CoilBody, R>(parts: KindParts<S, X, R>): KindParts<S, X, R> => parts;
