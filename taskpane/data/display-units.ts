/**
 * The display-unit choices of the pane. Each is a units text that core's parser reads, so the
 * pane converts with exactly the factors the cell functions use.
 */
import { parseUnits, type UnitSystem } from "../../core/units/units";

/** Identifier of a display-unit choice. */
export type DisplayUnitsId = "si" | "c-bar" | "f-psi";

/** One choice in the units selector. */
export interface DisplayUnits {
  readonly id: DisplayUnitsId;
  /** Text of the option in the selector. */
  readonly label: string;
  /** The same text a user would type as the `units` argument of a PHASE function. */
  readonly unitsText: string;
  readonly system: UnitSystem;
  /**
   * The units text of the heating and cooling path: the same temperature and pressure, with a
   * mass and an energy unit (the reference data's text may carry an amount unit for molar mass,
   * which would turn the path's mass into moles).
   */
  readonly pathUnitsText: string;
  readonly pathSystem: UnitSystem;
}

function choice(id: DisplayUnitsId, label: string, unitsText: string, pathUnitsText: string): DisplayUnits {
  return { id, label, unitsText, system: parseUnits(unitsText), pathUnitsText, pathSystem: parseUnits(pathUnitsText) };
}

/**
 * SI keeps the functions' defaults (K, Pa, kg/m3, kg/mol), so the pane shows the very numbers a
 * cell returns without a units argument. The other two add the mass and amount units their users
 * expect for molar mass (g/mol; lb/lbmol) and, for US units, density in lb/ft3. For paths, SI
 * keeps J and kg; the others use the energy units their users quote heat loads in (kJ; BTU).
 */
export const DISPLAY_UNITS: readonly DisplayUnits[] = [
  choice("si", "SI (K, Pa)", "K Pa", "K Pa J kg"),
  choice("c-bar", "°C, bar", "C bar g mol", "C bar kJ kg"),
  choice("f-psi", "°F, psi", "F psi lb lbmol lb/ft3", "F psi BTU lb"),
];

/** The choice with this id; the first (SI) for an unknown id. */
export function displayUnitsById(id: string): DisplayUnits {
  return DISPLAY_UNITS.find((candidate) => candidate.id === id) ?? DISPLAY_UNITS[0]!;
}
