/**
 * Standard atomic weights of the elements the substance library needs, and molar masses
 * computed from them.
 *
 * Source: M. E. Wieser, M. Berglund, Atomic weights of the elements 2007 (IUPAC Technical
 * Report), Pure Appl. Chem. 81, 2131-2156 (2009), Table 1 (standard atomic weights 2007).
 */

/** Standard atomic weights 2007, g/mol. */
export const ATOMIC_WEIGHTS_2007 = {
  H: 1.00794,
  He: 4.002602,
  C: 12.0107,
  N: 14.0067,
  O: 15.9994,
  F: 18.9984032,
  Ne: 20.1797,
  S: 32.065,
  Ar: 39.948,
  Kr: 83.798,
  Xe: 131.293,
} as const;

/** An element symbol known to {@link ATOMIC_WEIGHTS_2007}. */
export type Element = keyof typeof ATOMIC_WEIGHTS_2007;

/** Molar mass, kg/mol, of a formula given as atom counts, e.g. C3H8 as C: 3, H: 8. */
export function molarMassOf(atoms: Readonly<Partial<Record<Element, number>>>): number {
  let gramsPerMole = 0;
  for (const [element, count] of Object.entries(atoms) as [Element, number][]) {
    gramsPerMole += ATOMIC_WEIGHTS_2007[element] * count;
  }
  return gramsPerMole / 1000;
}
