import type { SettingsInput } from '../../core/settings/schema';

/**
 * DEMO DATA. An invented shop with invented machines, prices, finishes and stock, so a new user sees a
 * working store. No figure here is sourced: rates, prices and speeds are round numbers for show.
 */
export const demoSettings: SettingsInput = {
  shopProfile: {
    name: 'Demo: Harrow Bend Spring Works',
    addressLines: ['DEMO DATA: not a real company', '1 Example Yard', 'Harrow Bend'],
    phone: '+1 555 0100',
    email: 'quotes@harrow-bend.example',
  },
  defaults: { currency: 'USD', paperSize: 'letter', units: 'inch', toleranceGrade: 2, quoteValidityDays: 30 },
  numbering: { prefix: 'J-{yy}-', width: 4, next: 1, quotes: { prefix: 'Q-{yy}-', width: 4, next: 1 } },
  machines: [
    { id: 'coil-fine', name: 'Demo CNC coiler, fine wire', operation: 'coil', wireRange: { min: 0.1, max: 2 }, hourlyRate: 68, setupMinutes: 30,
      speedModel: { feedMetresPerMinute: 60, maxPiecesPerMinute: 120 } },
    { id: 'coil-mid', name: 'Demo CNC coiler, medium wire', operation: 'coil', wireRange: { min: 1, max: 6 }, hourlyRate: 82, setupMinutes: 45,
      speedModel: { feedMetresPerMinute: 40, maxPiecesPerMinute: 50 } },
    { id: 'coil-heavy', name: 'Demo CNC coiler, heavy wire', operation: 'coil', wireRange: { min: 4, max: 16 }, hourlyRate: 95, setupMinutes: 75,
      speedModel: { feedMetresPerMinute: 18, maxPiecesPerMinute: 12 } },
    { id: 'grind-1', name: 'Demo double-disc end grinder', operation: 'grind', wireRange: { min: 0.5, max: 16 }, hourlyRate: 60, setupMinutes: 40,
      piecesPerHour: 1500 },
    { id: 'grind-2', name: 'Demo single-wheel end grinder', operation: 'grind', wireRange: { min: 0.5, max: 8 }, hourlyRate: 38, setupMinutes: 15,
      piecesPerHour: 300, scrapPercent: 2 },
    { id: 'oven-1', name: 'Demo stress-relief oven', operation: 'stress-relieve', wireRange: { min: 0, max: 16 }, hourlyRate: 35, setupMinutes: 10,
      batch: { capacityPieces: 20000, cycleMinutes: 45 } },
    { id: 'set-1', name: 'Demo set-removal press', operation: 'set', wireRange: { min: 0.3, max: 16 }, hourlyRate: 48, setupMinutes: 15,
      piecesPerHour: 900 },
    { id: 'peen-1', name: 'Demo shot-peen cabinet', operation: 'shot-peen', wireRange: { min: 1, max: 16 }, hourlyRate: 55, setupMinutes: 20,
      batch: { capacityPieces: 2000, cycleMinutes: 30 } },
    { id: 'test-1', name: 'Demo load tester', operation: 'load-test', wireRange: { min: 0, max: 16 }, hourlyRate: 45, setupMinutes: 10,
      piecesPerHour: 600 },
    { id: 'loop-1', name: 'Demo loop former', operation: 'loop-form', wireRange: { min: 0.3, max: 8 }, hourlyRate: 50, setupMinutes: 20,
      piecesPerHour: 450 },
    { id: 'leg-1', name: 'Demo leg former', operation: 'leg-form', wireRange: { min: 0.3, max: 8 }, hourlyRate: 50, setupMinutes: 25,
      piecesPerHour: 400 },
    { id: 'pack-1', name: 'Demo packing bench', operation: 'pack', wireRange: { min: 0, max: 16 }, hourlyRate: 30, setupMinutes: 5,
      piecesPerHour: 2500 },
  ],
  materialPrices: [
    { grade: 'astm-a228', dMin: 0.1, dMax: 1, pricePerKg: 9.5, date: '2026-01-15', supplier: 'Demo Wire Supply' },
    { grade: 'astm-a228', dMin: 1, dMax: 6.35, pricePerKg: 6.2, date: '2026-01-15', supplier: 'Demo Wire Supply' },
    { grade: 'astm-a229', dMin: 0.5, dMax: 12.7, pricePerKg: 5.4, date: '2026-01-15', supplier: 'Demo Wire Supply' },
    { grade: 'astm-a313-302', dMin: 0.3, dMax: 10, pricePerKg: 14.8, date: '2026-02-01', supplier: 'Demo Stainless Ltd' },
    { grade: 'en10270-1-sh', dMin: 0.3, dMax: 20, pricePerKg: 4.9, date: '2026-02-01', supplier: 'Demo Wire Supply' },
    { grade: 'en10270-1-dh', dMin: 0.3, dMax: 20, pricePerKg: 5.6, date: '2026-02-01', supplier: 'Demo Wire Supply' },
    { grade: 'en10270-2-vdsicr', dMin: 0.5, dMax: 10, pricePerKg: 11.2, date: '2026-02-01', supplier: 'Demo Valve Wire Co' },
    { grade: 'en10270-3-1.4310', dMin: 0.2, dMax: 10, pricePerKg: 13.9, date: '2026-02-01', supplier: 'Demo Stainless Ltd' },
  ],
  finishes: [
    { id: 'oil', name: 'Light oil', vendor: '', pricePerKg: 0.2, lotMinimum: 0, electroplated: false, inHouse: true },
    { id: 'zinc-yellow', name: 'Zinc plate, yellow passivate', vendor: 'Demo Platers', pricePerKg: 3.5, lotMinimum: 85, electroplated: true,
      bakeSpecification: 'ASTM B850, 22 h at 200 °C' },
    { id: 'black-oxide', name: 'Black oxide', vendor: 'Demo Platers', pricePerKg: 2.8, lotMinimum: 60, electroplated: false },
    { id: 'passivate', name: 'Passivate (stainless)', vendor: 'Demo Platers', pricePerPiece: 0.02, lotMinimum: 50, electroplated: false },
  ],
  wireStock: [
    { grade: 'astm-a228', d: 0.5, kg: 40, heatNumber: 'DEMO-H1001' },
    { grade: 'astm-a228', d: 1.6, kg: 120 },
    { grade: 'en10270-1-sh', d: 2, kg: 250, heatNumber: 'DEMO-H2040' },
    { grade: 'en10270-1-sh', d: 4, kg: 300 },
    { grade: 'en10270-3-1.4310', d: 1, kg: 35 },
  ],
  costing: {
    scrapPercentByOperation: { coil: 3, grind: 1.5, 'stress-relieve': 0.5, 'shot-peen': 0.5 },
    setupScrapMetres: 6, overheadPercent: 28, marginPercent: 22, inspectionHourlyRate: 48,
    packagingPerPiece: 0.015, minimumOrderValue: 175, unitPriceRounding: { rule: 'significant', digits: 4 },
  },
  extraOperations: [
    { id: 'tumble', name: 'Demo tumble deburr', hourlyRate: 32, setupMinutes: 10, piecesPerHour: 4000 },
    { id: 'inspect-100', name: 'Demo extra inspection, every piece', hourlyRate: 48, setupMinutes: 5, piecesPerHour: 500 },
    { id: 'customer-test', name: 'Demo customer\'s special test', hourlyRate: 55, setupMinutes: 30, piecesPerHour: 250 },
  ],
};

/** DEMO customers: invented names, marked so nobody mistakes them for real ones. */
export const demoCustomers = [
  { name: 'Kestrel Pump Systems (demo)', email: 'buyer@kestrel-pumps.example', phone: '+1 555 0111' },
  { name: 'Larkfield Farm Machinery (demo)', email: 'parts@larkfield.example', phone: '+1 555 0122' },
  { name: 'Ossory Door Hardware (demo)', email: 'purchasing@ossory.example', phone: '+44 20 7946 0133' },
  { name: 'Brightwater Instruments (demo)', email: 'rfq@brightwater.example', phone: '+1 555 0144' },
  { name: 'Tamsin Medical Devices (demo)', email: 'supply@tamsin-med.example', phone: '+44 20 7946 0155' },
  { name: 'Redgate Racing Components (demo)', email: 'engineering@redgate.example', phone: '+1 555 0166' },
] as const;
