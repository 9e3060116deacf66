import { settingsSchema } from '../../core/settings/schema';
import type { Settings } from '../../core/settings/schema';
import { parseRequirement } from '../../core/requirement';
import type { CompressionRequirement, CompressionRequirementInput } from '../../core/requirement';
import { demoSettings } from '../../db/demo/shop';
import valveSeatFile from '../../examples/valve-seat.requirement.json';

export type RequirementInput = CompressionRequirementInput;

/** The demo shop's settings (DEMO DATA: invented machines, prices and stock). */
export const demoShop: Settings = settingsSchema.parse(demoSettings);

/** The example requirement kept in examples/ (DEMO DATA: an invented part). */
export const valveSeat = valveSeatFile as RequirementInput;

export function requirementOf(raw: unknown): CompressionRequirement {
  const r = parseRequirement(raw);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  if (r.value.kind !== 'compression') throw new Error('not a compression requirement');
  return r.value;
}
