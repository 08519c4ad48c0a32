/**
 * The engineering-grade substances, in the order the substance list shows them: cryogens,
 * hydrocarbons, refrigerants and other inorganic gases, solvents. One data module per substance.
 */
import { acetone } from "./acetone";
import { ammonia } from "./ammonia";
import { argon } from "./argon";
import { benzene } from "./benzene";
import { butane } from "./butane";
import { carbonMonoxide } from "./carbon-monoxide";
import { ethane } from "./ethane";
import { ethanol } from "./ethanol";
import { ethylene } from "./ethylene";
import { helium } from "./helium";
import { hexane } from "./hexane";
import { hydrogen } from "./hydrogen";
import { hydrogenSulfide } from "./hydrogen-sulfide";
import { isobutane } from "./isobutane";
import { krypton } from "./krypton";
import { methane } from "./methane";
import { methanol } from "./methanol";
import { neon } from "./neon";
import { nitrogen } from "./nitrogen";
import { nitrousOxide } from "./nitrous-oxide";
import { oxygen } from "./oxygen";
import { propane } from "./propane";
import { r134a } from "./r134a";
import { r32 } from "./r32";
import { sulfurDioxide } from "./sulfur-dioxide";
import { toluene } from "./toluene";
import type { SubstanceDefinition } from "./types";
import { xenon } from "./xenon";

/** Every engineering-grade substance. */
export const ENGINEERING_SUBSTANCES: readonly SubstanceDefinition[] = [
  // Cryogens
  nitrogen,
  oxygen,
  argon,
  hydrogen,
  helium,
  neon,
  krypton,
  xenon,
  carbonMonoxide,
  // Hydrocarbons
  methane,
  ethane,
  ethylene,
  propane,
  butane,
  isobutane,
  // Refrigerants and other inorganic gases
  ammonia,
  r134a,
  r32,
  nitrousOxide,
  sulfurDioxide,
  hydrogenSulfide,
  // Solvents
  methanol,
  ethanol,
  acetone,
  benzene,
  toluene,
  hexane,
];
