/**
 * IAPWS R10-06(2009) Gibbs function of ice Ih, tested through the module's public exports: the
 * release's check values, the energy zero it shares with IF97, and thermodynamic identities.
 */
import { describe, expect, it } from "vitest";
import { region1 } from "../../../../core/models/iapws-if97/region1";
import { iceIh, type IceProperties } from "../../../../core/models/iapws-r10/ice-ih";
import { expectClose } from "../../../helpers/expect-close";
import { printed } from "../../printed";

type Key = keyof IceProperties;

/** Table 6 states: (T / K, p / Pa). */
const STATES: readonly (readonly [number, number])[] = [
  [273.16, 611.657],
  [273.152519, 101325],
  [100, 100e6],
];

/** Table 6 rows: quantity, then its value at each of the three states as printed, SI units. */
const TABLE_6_ROWS: readonly (readonly [Key, string, string, string])[] = [
  ["gibbs", "0.611784135", "101.34274069", "-222296.513088"],
  ["gp", "0.00109085812737", "0.00109084388214", "0.0010619338926"],
  ["gt", "1220.6943394", "1220.7693255", "2611.95122589"],
  ["gpp", "-1.28495941571e-13", "-1.28485364928e-13", "-9.41807981761e-14"],
  ["gtp", "1.743879647e-7", "1.74362219972e-7", "2.74505162488e-8"],
  ["gtt", "-7.67602985875", "-7.67598233365", "-8.66333195517"],
  ["enthalpy", "-333444.253966", "-333354.873637", "-483491.635676"],
  ["helmholtz", "-0.055446875", "-9.18701567", "-328489.902347"],
  ["internalEnergy", "-333444.921197", "-333465.403393", "-589685.024936"],
  ["entropy", "-1220.6943394", "-1220.7693255", "-2611.95122589"],
  ["isobaricHeatCapacity", "2096.78431622", "2096.71391024", "866.333195517"],
  ["density", "916.7094922", "916.721463419", "941.678203297"],
  ["expansion", "0.000159863102566", "0.000159841589458", "2.58495528207e-5"],
  ["pressureCoefficient", "1357147.64659", "1357058.99321", "291466.166994"],
  ["isothermalCompressibility", "1.17793449348e-10", "1.17785291765e-10", "8.86880048115e-11"],
  ["isentropicCompressibility", "1.14161597779e-10", "1.14154442556e-10", "8.86060982687e-11"],
];

// Check values: IAPWS R10-06(2009), Table 6 — all 16 quantities (g, its five derivatives, h, f,
// u, s, c_p, rho, alpha, beta, kappa_T, kappa_s) at all three states (273.16 K, 611.657 Pa;
// 273.152519 K, 101325 Pa; 100 K, 100 MPa), 9 to 12 significant digits as printed, in J, kg, K,
// Pa. Tolerance: half a unit in the last printed digit. Worst measured: 0.996 of that half unit
// (kappa_s at 273.152519 K), then 0.99 (g_pp at the triple point).
const TABLE_6 = TABLE_6_ROWS.flatMap(([key, ...texts]) =>
  STATES.map(([temperatureK, pressurePa], k) => [key, temperatureK, pressurePa, texts[k]!] as const),
);

describe("R10-06(2009) ice Ih check values", () => {
  it.each(TABLE_6)("%s at %s K, %s Pa matches Table 6 to every printed digit", (key, temperatureK, pressurePa, text) => {
    const check = printed(text);
    expectClose(iceIh(temperatureK, pressurePa)[key], check.value, { abs: check.halfUnit });
  });
});

describe("R10-06 ice Ih and the IAPWS energy zero shared with IF97", () => {
  const liquid = region1(273.16, 611.657);
  const ice = iceIh(273.16, 611.657);

  // From the published numbers alone: IF97 Eq. (10) gives h' = 0.611783 J/kg for the liquid at
  // the triple point and R10-06(2009) Table 6 gives h = −333444.253966 J/kg for ice there, so the
  // melting enthalpy is 333444.865749 J/kg. Tolerance: the two half units of the printed digits
  // added (5e-7 + 5e-7 J/kg).
  it("gives the melting enthalpy at the triple point implied by IF97 Eq. (10) and Table 6", () => {
    expectClose(liquid.enthalpy - ice.enthalpy, 0.611783 + 333444.253966, { abs: 1e-6 });
  });

  // Derived from IF97/R10-06 and cross-checked against IAPWS-95: the melting enthalpy at the
  // triple point is 333.4449 kJ/kg with the IAPWS-95 liquid (IAPWS-95 minus R10-06). IAPWS-95
  // meets the same zero: its h' there is 0.611781 J/kg (computed with python3-iapws), 2e-6 J/kg
  // from IF97's. With the IF97 region 1 liquid, measured 333.444866 kJ/kg. Tolerance: half a unit
  // in the last digit of 333.4449 kJ/kg (0.05 J/kg).
  it("agrees with the IAPWS-95 melting enthalpy at the triple point, 333.4449 kJ/kg", () => {
    const check = printed("333.4449");
    expectClose((liquid.enthalpy - ice.enthalpy) / 1e3, check.value, { abs: check.halfUnit });
  });

  // Ice and liquid have equal Gibbs energies at the triple point. R10-06 was fitted to IAPWS-95,
  // which meets u' = s' = 0 exactly; IF97 region 1 carries s' = −6.2e-5 J/(kg·K) there (measured,
  // see region1.test.ts), which shifts its g by −T·s' = +0.017 J/kg (measured 0.0168 J/kg).
  // Bound: T_t times the 1e-4 J/(kg·K) bound on s' asserted for region 1, rounded up to
  // 0.03 J/kg — a melting-temperature shift of 0.03/1221 = 2.5e-5 K.
  it("has the liquid's Gibbs energy at the triple point", () => {
    const liquidGibbs = liquid.enthalpy - 273.16 * liquid.entropy;
    expectClose(ice.gibbs, liquidGibbs, { abs: 0.03 });
  });
});

describe("R10-06 ice Ih thermodynamic identities", () => {
  const states: [number, number][] = [];
  for (const temperatureK of [20, 50, 100, 150, 200, 250, 273]) {
    for (const pressurePa of [611.657, 1e5, 1e7, 1e8, 2e8]) states.push([temperatureK, pressurePa]);
  }

  // Central difference with a 0.01 K step: within 1.5e-8 relative of c_p on these states
  // (measured), inside the 1e-6 bound.
  it("c_p equals dh/dT along the isobar", () => {
    for (const [temperatureK, pressurePa] of states) {
      const dT = 0.01;
      const slope = (iceIh(temperatureK + dT, pressurePa).enthalpy - iceIh(temperatureK - dT, pressurePa).enthalpy) / (2 * dT);
      expectClose(iceIh(temperatureK, pressurePa).isobaricHeatCapacity, slope, { rel: 1e-6 });
    }
  });

  // kappa_s = kappa_T − T·v·alpha²/c_p and beta = alpha/kappa_T hold exactly; measured to 2e-16.
  it("kappa_s = kappa_T − T·v·alpha²/c_p, beta = alpha/kappa_T, h = u + p·v, rho·v = 1", () => {
    for (const [temperatureK, pressurePa] of states) {
      const s = iceIh(temperatureK, pressurePa);
      const kappaS = s.isothermalCompressibility - (temperatureK * s.specificVolume * s.expansion ** 2) / s.isobaricHeatCapacity;
      expectClose(s.isentropicCompressibility, kappaS, { rel: 1e-13 });
      expectClose(s.pressureCoefficient, s.expansion / s.isothermalCompressibility, { rel: 1e-13 });
      expectClose(s.enthalpy, s.internalEnergy + pressurePa * s.specificVolume, { rel: 1e-13 });
      expectClose(s.density * s.specificVolume, 1, { rel: 1e-15 });
    }
  });

  // A crystal's heat capacity rises with temperature (common practice); R10-06 keeps c_p
  // positive and rising from 1 K to the triple point at 101325 Pa.
  it("has a positive isobaric heat capacity rising with temperature", () => {
    let previous = 0;
    for (let temperatureK = 1; temperatureK <= 273.16; temperatureK += 0.5) {
      const cp = iceIh(temperatureK, 101325).isobaricHeatCapacity;
      expect(cp).toBeGreaterThan(previous);
      previous = cp;
    }
  });
});
