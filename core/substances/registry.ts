/**
 * The substances Phasecell knows, looked up by any alias: common name, formula, CAS number or
 * ASHRAE 34 refrigerant number, case-insensitively.
 */
import { BadInputError } from "../errors";
import { foldName, nearestNames } from "../names";
import type { SubstanceDefinition } from "./types";
import { co2 } from "./co2";
import { ENGINEERING_SUBSTANCES } from "./engineering-library";
import { water } from "./water";

/** Every substance, in the order the substance list shows them. */
export const SUBSTANCES: readonly SubstanceDefinition[] = [water, co2, ...ENGINEERING_SUBSTANCES];

const byAlias = new Map<string, SubstanceDefinition>();
for (const substance of SUBSTANCES) {
  for (const alias of [substance.id, substance.name, substance.formula, substance.cas, ...substance.aliases]) {
    const key = foldName(alias);
    const existing = byAlias.get(key);
    if (existing && existing !== substance) {
      throw new Error(`alias ${alias} names both ${existing.id} and ${substance.id}`);
    }
    byAlias.set(key, substance);
  }
}

/**
 * Finds a substance by any of its names.
 * @throws BadInputError naming the nearest known names when none matches.
 */
export function findSubstance(name: string): SubstanceDefinition {
  const found = byAlias.get(foldName(name));
  if (found) return found;
  const allNames = SUBSTANCES.flatMap((s) => [s.name, ...s.aliases]);
  const near = nearestNames(name, allNames);
  const hint = near.length > 0 ? `Did you mean ${near.map((n) => `"${n}"`).join(" or ")}? ` : "";
  throw new BadInputError([
    `unknown substance "${name.trim()}". ${hint}Known substances: ` +
      `${SUBSTANCES.map((s) => s.name).join(", ")} (names, formulas, CAS and refrigerant numbers ` +
      `all work; PHASE.SUBSTANCES lists them)`,
  ]);
}
