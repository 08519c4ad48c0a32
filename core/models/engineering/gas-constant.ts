/**
 * The molar gas constant shared by the engineering correlations.
 *
 * Source: BIPM, The International System of Units (SI), 9th ed. (2019): the Avogadro constant
 *   N_A = 6.022 140 76e23 /mol and the Boltzmann constant k = 1.380 649e-23 J/K are exact, so
 *   R = N_A k is exact; its first digits are 8.314 462 618 153 24 J/(mol K).
 * Deviations: none. Older compilations (Poling et al. 2001, the VDI Heat Atlas 2010) used
 *   R = 8.314 472 J/(mol K); the difference, 1.2e-6 relative, is far below their uncertainty.
 */

/** Molar gas constant, J/(mol K). */
export const MOLAR_GAS_CONSTANT = 6.02214076e23 * 1.380649e-23;
