/**
 * Fixed points and constants of carbon dioxide as used by every equation of Span and Wagner
 * (1996): the reducing parameters of the ancillary equations and of the Helmholtz equation of
 * state, the gas constant and the molar mass.
 *
 * Source: R. Span, W. Wagner, A New Equation of State for Carbon Dioxide Covering the Fluid Region
 *   from the Triple-Point Temperature to 1100 K at Pressures up to 800 MPa, J. Phys. Chem. Ref.
 *   Data 25, 1509-1596 (1996), doi:10.1063/1.555991: the triple and critical points, gas constant
 *   and molar mass the paper uses in its ancillary equations and its equation of state.
 * Deviations from the text: none. The values are those the paper uses in its equations; other
 *   publications give the triple point to a few millikelvin and ten pascals apart (see the tests).
 */

/** Critical temperature T_c, K. */
export const SW96_CRITICAL_TEMPERATURE = 304.1282;
/** Critical pressure p_c, Pa (7.3773 MPa). */
export const SW96_CRITICAL_PRESSURE = 7.3773e6;
/** Critical density rho_c, kg/m³. */
export const SW96_CRITICAL_DENSITY = 467.6;
/** Triple-point temperature T_t, K. */
export const SW96_TRIPLE_TEMPERATURE = 216.592;
/** Triple-point pressure p_t, Pa (0.51795 MPa). */
export const SW96_TRIPLE_PRESSURE = 0.51795e6;
/**
 * Specific gas constant R, J/(kg·K): 0.1889241 kJ/(kg·K) as the paper prints it, which is the molar
 * gas constant it uses, 8.31451 J/(mol·K), divided by its molar mass, 44.0098 g/mol, to the
 * printed digits (8.31451 / 0.0440098 = 188.924103… J/(kg·K)).
 */
export const SW96_GAS_CONSTANT = 188.9241;
/** Molar mass M, kg/mol (44.0098 g/mol, from atomic weights with C = 12.011). */
export const SW96_MOLAR_MASS = 0.0440098;
/** Upper temperature limit of the equation of state, K (the paper's title). */
export const SW96_T_MAX = 1100;
/** Upper pressure limit of the equation of state, Pa (800 MPa, the paper's title). */
export const SW96_P_MAX = 800e6;
