import type { JobStatus } from '../../core/api/store';

/**
 * DEMO DATA: about thirty invented jobs of the demo shop, across kinds and statuses, in inch and metric.
 * Each entry carries a whole spec, so a new spring kind's jobs are added here the same way.
 */
export interface DemoJob {
  customer: number;
  partNumber: string;
  drawingNumber: string;
  drawingRevision: string;
  status: JobStatus;
  notes: string;
  daysAgo: number;
  dueInDays?: number;
  orderQuantity?: number;
  leadTimeDays?: number;
  spec: Record<string, unknown>;
}

type Ends = 'closed-ground' | 'closed' | 'open-ground' | 'open';

/** A compression spec from the numbers a drawing gives: wire, OD, total coils, ends, free length. */
function compression(units: 'metric' | 'inch', material: string, d: number, od: number, nt: number, ends: Ends, L0: number,
  extra: Record<string, unknown> = {}): Record<string, unknown> {
  return { kind: 'compression', units, material, wireDiameter: d, outerDiameter: od, totalCoils: nt, ends, freeLength: L0, ...extra };
}

const load = (length: number, force: number, tolerancePercent = 10) => ({ loads: [{ length, force, tolerancePercent }] });

export const demoJobs: DemoJob[] = [
  { customer: 0, partNumber: 'KPS-2210-A', drawingNumber: 'KP-D-2210', drawingRevision: 'C', status: 'in-production', notes: 'Valve return spring, pump head. Demo job.',
    daysAgo: 40, dueInDays: 10, orderQuantity: 5000, leadTimeDays: 21,
    spec: compression('metric', 'en10270-2-vdsicr', 2.5, 18, 8, 'closed-ground', 40, { duty: { type: 'cyclic', between: [34, 28], cycles: 10_000_000 } }) },
  { customer: 0, partNumber: 'KPS-2211', drawingNumber: 'KP-D-2211', drawingRevision: 'A', status: 'quoted', notes: 'Lighter version of KPS-2210 for the small pump.',
    daysAgo: 12, orderQuantity: 2500, spec: compression('metric', 'en10270-2-vdsicr', 2.2, 16, 8, 'closed-ground', 38) },
  { customer: 0, partNumber: 'KPS-0904', drawingNumber: 'KP-D-0904', drawingRevision: 'B', status: 'done', notes: 'Seal spring, stainless.',
    daysAgo: 160, orderQuantity: 10000, spec: compression('metric', 'en10270-3-1.4310', 0.8, 9, 10, 'closed-ground', 22, load(16, 12)) },
  { customer: 0, partNumber: 'KPS-0905', drawingNumber: 'KP-D-0905', drawingRevision: 'A', status: 'lost', notes: 'Lost on price to an overseas quote.',
    daysAgo: 120, orderQuantity: 20000, spec: compression('metric', 'en10270-3-1.4310', 1, 10, 9, 'closed-ground', 25) },
  { customer: 0, partNumber: 'KPS-3300', drawingNumber: 'KP-D-3300', drawingRevision: 'A', status: 'draft', notes: 'RFQ received by email, drawing attached later.',
    daysAgo: 2, spec: compression('metric', 'en10270-1-dh', 3, 26, 9, 'closed-ground', 60) },
  { customer: 1, partNumber: 'LFM-77-118', drawingNumber: 'LF 77118', drawingRevision: '2', status: 'ordered', notes: 'Seed drill tine spring, heavy wire, zinc plated.',
    daysAgo: 25, dueInDays: 30, orderQuantity: 800, leadTimeDays: 35, spec: compression('inch', 'astm-a229', 0.25, 2, 9, 'closed-ground', 5, { finish: 'zinc-yellow' }) },
  { customer: 1, partNumber: 'LFM-77-119', drawingNumber: 'LF 77119', drawingRevision: '1', status: 'quoted', notes: 'Companion spring to LFM-77-118.',
    daysAgo: 20, orderQuantity: 800, spec: compression('inch', 'astm-a229', 0.207, 1.75, 10, 'closed-ground', 4.5) },
  { customer: 1, partNumber: 'LFM-12-004', drawingNumber: 'LF 12004', drawingRevision: '4', status: 'done', notes: 'Seat suspension spring. Repeat order every spring season.',
    daysAgo: 300, orderQuantity: 400, spec: compression('inch', 'astm-a229', 0.375, 3, 8, 'closed-ground', 7) },
  { customer: 1, partNumber: 'LFM-12-005', drawingNumber: 'LF 12005', drawingRevision: '1', status: 'draft', notes: 'Customer asks for a shorter free length than LFM-12-004.',
    daysAgo: 5, spec: compression('inch', 'astm-a229', 0.375, 3, 7, 'closed-ground', 6) },
  { customer: 1, partNumber: 'LFM-30-210', drawingNumber: 'LF 30210', drawingRevision: '1', status: 'lost', notes: 'Customer moved the part to a torsion design.',
    daysAgo: 200, spec: compression('inch', 'astm-a227-1', 0.148, 1.25, 12, 'closed', 3.5) },
  { customer: 2, partNumber: 'ODH-LATCH-6', drawingNumber: 'ODH-1206', drawingRevision: 'F', status: 'in-production', notes: 'Latch spring, black oxide.',
    daysAgo: 30, dueInDays: 5, orderQuantity: 50000, leadTimeDays: 28, spec: compression('metric', 'en10270-1-sh', 1, 7, 12, 'closed', 20, { finish: 'black-oxide' }) },
  { customer: 2, partNumber: 'ODH-LATCH-7', drawingNumber: 'ODH-1207', drawingRevision: 'A', status: 'quoted', notes: 'Heavier latch spring for the fire door range.',
    daysAgo: 9, orderQuantity: 30000, spec: compression('metric', 'en10270-1-sh', 1.2, 8, 12, 'closed', 22) },
  { customer: 2, partNumber: 'ODH-HINGE-2', drawingNumber: 'ODH-0402', drawingRevision: 'B', status: 'done', notes: 'Hinge return spring.',
    daysAgo: 220, orderQuantity: 12000, spec: compression('metric', 'en10270-1-sh', 1.6, 12, 10, 'closed-ground', 35) },
  { customer: 2, partNumber: 'ODH-CLOSER-1', drawingNumber: 'ODH-0901', drawingRevision: 'D', status: 'ordered', notes: 'Door closer main spring, set removed.',
    daysAgo: 18, dueInDays: 40, orderQuantity: 3000, leadTimeDays: 42, spec: compression('metric', 'en10270-1-dh', 4, 32, 10, 'closed-ground', 90) },
  { customer: 2, partNumber: 'ODH-CLOSER-2', drawingNumber: 'ODH-0902', drawingRevision: 'A', status: 'draft', notes: 'Smaller closer, waiting for loads from the customer.',
    daysAgo: 1, spec: compression('metric', 'en10270-1-dh', 3.5, 28, 10, 'closed-ground', 80) },
  { customer: 3, partNumber: 'BWI-PR-015', drawingNumber: 'BW-5015', drawingRevision: '3', status: 'done', notes: 'Pressure gauge spring, music wire, tight load tolerance.',
    daysAgo: 150, orderQuantity: 6000, spec: compression('inch', 'astm-a228', 0.02, 0.18, 14, 'closed-ground', 0.6, load(0.45, 0.8, 5)) },
  { customer: 3, partNumber: 'BWI-PR-016', drawingNumber: 'BW-5016', drawingRevision: '1', status: 'quoted', notes: 'Next size up from BWI-PR-015.',
    daysAgo: 14, orderQuantity: 6000, spec: compression('inch', 'astm-a228', 0.024, 0.2, 14, 'closed-ground', 0.65) },
  { customer: 3, partNumber: 'BWI-TRIG-2', drawingNumber: 'BW-7002', drawingRevision: 'B', status: 'in-production', notes: 'Trigger spring, stainless, passivated.',
    daysAgo: 35, dueInDays: 3, orderQuantity: 15000, leadTimeDays: 20, spec: compression('inch', 'astm-a313-302', 0.016, 0.12, 12, 'closed', 0.4, { finish: 'passivate' }) },
  { customer: 3, partNumber: 'BWI-KNOB-9', drawingNumber: 'BW-7109', drawingRevision: 'A', status: 'draft', notes: 'Detent spring for the selector knob.',
    daysAgo: 3, spec: compression('inch', 'astm-a228', 0.012, 0.09, 10, 'closed', 0.25) },
  { customer: 3, partNumber: 'BWI-PR-020', drawingNumber: 'BW-5020', drawingRevision: '2', status: 'lost', notes: 'Project cancelled by the customer.',
    daysAgo: 90, spec: compression('inch', 'astm-a228', 0.032, 0.25, 12, 'closed-ground', 0.8) },
  { customer: 4, partNumber: 'TMD-INJ-1', drawingNumber: 'TM-1100', drawingRevision: 'E', status: 'ordered', notes: 'Injector spring, stainless, cleanroom packing.',
    daysAgo: 22, dueInDays: 25, orderQuantity: 100000, leadTimeDays: 30, spec: compression('metric', 'en10270-3-1.4310', 0.5, 5, 12, 'closed-ground', 18) },
  { customer: 4, partNumber: 'TMD-INJ-2', drawingNumber: 'TM-1101', drawingRevision: 'A', status: 'quoted', notes: 'Injector spring, longer stroke version.',
    daysAgo: 8, orderQuantity: 100000, spec: compression('metric', 'en10270-3-1.4310', 0.5, 5, 14, 'closed-ground', 22) },
  { customer: 4, partNumber: 'TMD-CLIP-3', drawingNumber: 'TM-2003', drawingRevision: 'B', status: 'done', notes: 'Clip spring.',
    daysAgo: 260, orderQuantity: 40000, spec: compression('metric', 'en10270-3-1.4310', 0.3, 3, 9, 'closed', 8) },
  { customer: 4, partNumber: 'TMD-PLUNGE-5', drawingNumber: 'TM-3005', drawingRevision: 'A', status: 'draft', notes: 'Plunger spring, awaiting material approval.',
    daysAgo: 4, spec: compression('metric', 'en10270-3-1.4310', 0.7, 6.5, 11, 'closed-ground', 24) },
  { customer: 5, partNumber: 'RRC-VS-44', drawingNumber: 'RRC-44-01', drawingRevision: 'G', status: 'in-production', notes: 'Valve spring, shot peened, 100 % load tested.',
    daysAgo: 45, dueInDays: 7, orderQuantity: 600, leadTimeDays: 45,
    spec: compression('inch', 'astm-a401', 0.177, 1.2, 7, 'closed-ground', 1.9, { shotPeen: true, duty: { type: 'cyclic', between: [1.6, 1.25], cycles: 50_000_000, peened: true } }) },
  { customer: 5, partNumber: 'RRC-VS-45', drawingNumber: 'RRC-45-01', drawingRevision: 'A', status: 'quoted', notes: 'Inner valve spring to nest in RRC-VS-44.',
    daysAgo: 15, orderQuantity: 600, spec: compression('inch', 'astm-a401', 0.12, 0.8, 8, 'closed-ground', 1.8, { shotPeen: true }) },
  { customer: 5, partNumber: 'RRC-CL-12', drawingNumber: 'RRC-12-03', drawingRevision: 'C', status: 'done', notes: 'Clutch spring.',
    daysAgo: 180, orderQuantity: 1200, spec: compression('inch', 'astm-a232', 0.135, 0.9, 9, 'closed-ground', 1.7) },
  { customer: 5, partNumber: 'RRC-BR-3', drawingNumber: 'RRC-03-02', drawingRevision: 'B', status: 'ordered', notes: 'Brake return spring.',
    daysAgo: 28, dueInDays: 20, orderQuantity: 2000, leadTimeDays: 25, spec: compression('metric', 'en10270-1-sh', 2, 15, 9, 'closed-ground', 45) },
  { customer: 5, partNumber: 'RRC-BR-4', drawingNumber: 'RRC-04-01', drawingRevision: 'A', status: 'draft', notes: 'Brake return spring, stiffer, same envelope as RRC-BR-3.',
    daysAgo: 0, spec: compression('metric', 'en10270-1-sh', 2.2, 15, 9, 'closed-ground', 45) },
  { customer: 2, partNumber: 'ODH-LATCH-6B', drawingNumber: 'ODH-1206', drawingRevision: 'G', status: 'draft', notes: 'Drawing revision G of the latch spring: longer free length.',
    daysAgo: 0, spec: compression('metric', 'en10270-1-sh', 1, 7, 12, 'closed', 21) },
  { customer: 1, partNumber: 'LFM-40-020', drawingNumber: 'LF 40020', drawingRevision: '1', status: 'quoted', notes: 'Extension spring for the hopper lid stay.',
    daysAgo: 11, orderQuantity: 1500,
    spec: { kind: 'extension', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1.2, outerDiameter: 10, bodyCoils: 18, ends: ['machine-loop', 'machine-loop'],
      initialTension: 8, loads: [{ length: 45 }, { length: 55, force: 36, tolerancePercent: 10 }], loopAngle: 0, mechanicalStop: true } },
  { customer: 3, partNumber: 'BWI-RET-4', drawingNumber: 'BW-7404', drawingRevision: 'A', status: 'done', notes: 'Pointer return extension spring.',
    daysAgo: 140, orderQuantity: 8000,
    spec: { kind: 'extension', units: 'inch', material: 'astm-a228', wireDiameter: 0.035, outerDiameter: 0.3, bodyCoils: 22, ends: ['full-loop', 'crossover-loop'],
      initialTension: 1, loads: [{ length: 1.6 }] } },
  { customer: 2, partNumber: 'ODH-HANDLE-3', drawingNumber: 'ODH-0303', drawingRevision: 'B', status: 'ordered', notes: 'Lever handle return torsion spring.',
    daysAgo: 16, dueInDays: 24, orderQuantity: 20000, leadTimeDays: 28,
    spec: { kind: 'torsion', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1.5, outerDiameter: 14, bodyCoils: 6.25, legs: [{ length: 25 }, { length: 25 }], windDirection: 'right',
      freeAngle: 90, arborDiameter: 9, loads: [{ angle: 45 }, { angle: 90, torque: 290, tolerancePercent: 10 }] } },
  { customer: 5, partNumber: 'RRC-TH-8', drawingNumber: 'RRC-08-02', drawingRevision: 'A', status: 'draft', notes: 'Throttle return torsion spring, left hand.',
    daysAgo: 6, spec: { kind: 'torsion', units: 'inch', material: 'astm-a228', wireDiameter: 0.047, outerDiameter: 0.4, bodyCoils: 5.5,
      legs: [{ length: 0.75 }, { length: 1 }], windDirection: 'left', loads: [{ angle: 90 }] } },
];
