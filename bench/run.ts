/**
 * Speed of the hot paths, measured on one core in Node. Run with `npm run bench`, which bundles
 * this file with esbuild as an ES module first, so the code runs as it does in the add-in's own
 * bundle (a module loader that compiles each TypeScript file to CommonJS on the fly adds a getter
 * call to every imported function and would measure that instead).
 * Each case runs for a fixed wall-clock budget after a warm-up and reports evaluations per second.
 */
import { pathEnergy, pathEnergyOnIsobar } from "../core/path";
import { phaseAt, saturationPressure, saturationTemperature, meltingTemperature } from "../core/phase";
import { findSubstance } from "../core/substances/registry";

(globalThis as Record<string, unknown>)["CustomFunctions"] = {
  associate() {},
  ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A" },
  Error: class extends Error {},
};

interface Case {
  readonly name: string;
  readonly run: (i: number) => unknown;
  /** Evaluations per call of run. */
  readonly perCall?: number;
}

function measure(benchCase: Case, seconds = 1): number {
  let sink = 0;
  for (let i = 0; i < 2000; i++) sink += Number(Boolean(benchCase.run(i)));
  let calls = 0;
  const start = performance.now();
  const end = start + seconds * 1000;
  while (performance.now() < end) {
    for (let i = 0; i < 100; i++) sink += Number(Boolean(benchCase.run(calls + i)));
    calls += 100;
  }
  const elapsed = (performance.now() - start) / 1000;
  if (sink < 0) console.log(sink);
  return (calls * (benchCase.perCall ?? 1)) / elapsed;
}

async function main(): Promise<void> {
  const functions = await import("../functions/index");
  const water = findSubstance("water");
  const co2 = findSubstance("carbon dioxide");
  const nitrogen = findSubstance("nitrogen");
  const column = Array.from({ length: 1000 }, (_, i) => [-50 + i * 0.4]);
  const atmosphere = pathEnergyOnIsobar(water, 101325);
  const cases: Case[] = [
    { name: "core saturationPressure (IF97 Eq. 30)", run: (i) => saturationPressure(water, 280 + (i % 300)) },
    { name: "core saturationTemperature (IF97 Eq. 31)", run: (i) => saturationTemperature(water, 1e3 + (i % 1000) * 2e4) },
    { name: "core meltingTemperature (R14-08 inverted)", run: (i) => meltingTemperature(water, 1e5 + (i % 1000) * 1e6) },
    { name: "core phaseAt", run: (i) => phaseAt(water, 200 + (i % 500), 10 ** (2 + (i % 7))) },
    // Goal: an isobaric path energy for water at 100 000 evaluations per second or more.
    { name: "core pathEnergy, water, ice to steam at 1 atm", run: (i) => pathEnergy(water, 1, 250 + (i % 10), 420, 101325) },
    { name: "core pathEnergy, water, liquid to liquid at 5 bar", run: (i) => pathEnergy(water, 1, 290 + (i % 10), 350, 5e5) },
    { name: "core pathEnergyOnIsobar at 1 atm, liquid to vapour", run: (i) => atmosphere(1, 290 + (i % 10), 420) },
    { name: "core pathEnergy, CO2, dry ice to gas at 1 atm", run: (i) => pathEnergy(co2, 1, 180 + (i % 10), 300, 101325) },
    { name: "core pathEnergy, CO2, liquid to vapour at 20 bar", run: (i) => pathEnergy(co2, 1, 230 + (i % 10), 300, 20e5) },
    { name: "core pathEnergy, nitrogen, liquid to gas at 1 atm", run: (i) => pathEnergy(nitrogen, 1, 70 + (i % 5), 300, 101325) },
    {
      name: "PHASE.PATHENERGY over a 1000-cell column (per cell)",
      run: () => functions.pathEnergyFn([["water"]], [[1]], column, [[120]], [[1.01325]], "C bar kJ kg"),
      perCall: 1000,
    },
    {
      name: "PHASE.STATE over a 1000-cell column (per cell)",
      run: () => functions.state([["water"]], column, [[1.01325]], "C bar"),
      perCall: 1000,
    },
    {
      name: "PHASE.SATTEMP single cell with units",
      run: (i) => functions.satTemp([["water"]], [[1 + (i % 100)]], "C bar"),
    },
  ];
  console.log(`Phasecell benchmarks (Node ${process.version}, one core)`);
  for (const benchCase of cases) {
    const rate = measure(benchCase);
    console.log(`${benchCase.name.padEnd(52)} ${Math.round(rate).toLocaleString("en-US").padStart(12)} evaluations/s`);
  }
}

void main();
