import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { travellerDocument } from '../../../core/documents';
import { planInSpecUnits, planManufacture } from '../../../core/process/plan';
import { renderTraveller } from '../../../service/pdf';
import { Operations } from '../../../renderer/screens/workspace/panes/PlanTables';
import { setSpringSpec, settingsWith, specOf } from './fixtures';
import { ISSUED_AT, norm, pdfText, root } from './helpers';

/** The coiler's settings for a spring that needs set removal, as the setter reads them. */
const read = [
  { kind: 'coil', label: 'Coiled free length' },
  { kind: 'coil', label: 'Pitch as coiled' },
  { kind: 'coil', label: 'Wire per piece' },
  { kind: 'coil', label: 'Total coils' },
  { kind: 'coil', label: 'Active coils' },
  { kind: 'set', label: 'Expected set' },
  { kind: 'set', label: 'Strokes' },
] as const;

const escape = (s: string) => s.replace(/[()]/g, (c) => `\\${c}`);
const numberAfter = (text: string, label: string): number => {
  const m = new RegExp(`${escape(label)}:? ([0-9.]+)`).exec(text);
  if (!m) throw new Error(`"${label}" not found`);
  return Number(m[1]);
};

describe('the coiler\'s settings agree on the screen, the traveller PDF and cli sheet', () => {
  const spec = specOf(setSpringSpec);
  const settings = settingsWith();
  const plan = planInSpecUnits(planManufacture(spec, settings, 1000));
  const value = (kind: string, label: string) =>
    plan.operations.find((o) => o.kind === kind)!.settings.find((s) => s.label === label)!.value as number;

  it('for a compression spring that needs set removal', async () => {
    expect(plan.operations.map((o) => o.kind)).toContain('set');
    expect(plan.coiledFreeLength!).toBeGreaterThan(plan.freeLength!);
    expect(value('coil', 'Coiled free length')).toBe(plan.coiledFreeLength);
    expect(value('coil', 'Wire per piece')).toBe(plan.wireLengthPerPiece);

    const screen = norm(renderToStaticMarkup(createElement(Operations, { plan })).replace(/<[^>]+>/g, ' '));
    const model = travellerDocument({ spec, settings, job: {
      number: 'J-26-0077', customerName: 'Kestrel Test Pumps (demo)', partNumber: 'KTP-207', drawingNumber: 'KTP-D-207',
      drawingRevision: 'A', orderQuantity: 1000, dueDate: '2026-05-04' }, printedAt: ISSUED_AT });
    const pdf = (await pdfText(await renderTraveller(model))).all;

    const dir = mkdtempSync(join(tmpdir(), 'coilwright-coiler-'));
    const file = join(dir, 'spec.json');
    writeFileSync(file, JSON.stringify(setSpringSpec));
    const run = spawnSync(process.execPath, ['--import', 'tsx', 'service/cli/main.ts', 'sheet', file, '--quantity', '1000'],
      { cwd: root, encoding: 'utf8' });
    expect(run.status, run.stderr).toBe(0);
    const sheet = JSON.parse(run.stdout) as typeof plan; // printed in the spec's units already

    for (const { kind, label } of read) {
      const v = value(kind, label);
      // Shown rounded to the trade's precision: lengths to 0.01 mm, counts to 0.01.
      expect(numberAfter(screen, label), `screen ${label}`).toBeCloseTo(v, 2);
      expect(numberAfter(pdf, label), `traveller ${label}`).toBeCloseTo(v, 2);
      const fromCli = sheet.operations.find((o) => o.kind === kind)!.settings.find((s) => s.label === label)!.value;
      expect(fromCli, `cli sheet ${label}`).toBeCloseTo(v, 9);
    }
  });
});
