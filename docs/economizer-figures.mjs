// Prints the real-file figures of docs/economizer.md by running the `binenergy economizer` command
// (the built tool, --json) on the six check files. Run from the repository root after
// `dotnet build BinEnergy.sln`:
//
//   node docs/economizer-figures.mjs > /tmp/economizer-figures.md
//
// The reference system is invented (docs/economizer.md, "Real files"); nothing here computes
// physics: every number is the command's own output, only summed, divided and formatted.
import { execFileSync } from "node:child_process";

const tool = ["src/BinEnergy.Cli/bin/Debug/net10.0/binenergy.dll"];
const sites = [
  ["Melbourne FL", "722040TYA.CSV.gz", "tmy3"],
  ["Chicago IL", "725300TYA.CSV.gz", "tmy3"],
  ["Albuquerque NM", "723650TYA.CSV.gz", "tmy3"],
  ["Arcata CA", "725945TYA.CSV.gz", "tmy3"],
  ["Sand Point AK", "703165TY.csv.gz", "tmy3"],
  ["Piedmont IT", "tmy_45.000_8.000_2005_2023.csv.gz", "pvgis"],
];
const system = [
  "--supply-airflow", "10000", "--min-outdoor-airflow", "2000", "--supply-temp", "55", "--return-temp", "75",
  "--return-rh", "50", "--design-load", "216000", "--design-outdoor", "95", "--balance-point", "50",
  "--occupied", "Mon-Fri 07:00-19:00",
];
const controls = ["fixed_drybulb", "differential_drybulb", "fixed_enthalpy", "differential_enthalpy", "fixed_dewpoint"];

function run(file, map, extra) {
  const args = [...tool, "economizer", `tests/data/weather-open/${file}`, "--map", map, ...system, ...extra, "--json"];
  return JSON.parse(execFileSync("dotnet", args, { encoding: "utf8", maxBuffer: 64 << 20 }));
}

const n = (x) => Math.round(x).toLocaleString("en-US");
const s = (x) => (x >= 0 ? "+" : "-") + n(Math.abs(x));
const pct = (x) => (x >= 0 ? "+" : "-") + Math.abs(x).toFixed(1) + " %";
const saved = (c) => `${s(c.savings_kbtu)} (${pct(c.savings_pct)})`;
const byMethod = (d, control, method) => d.by_method.find((r) => r.control === control && r.method === method);

// The reference system without fans: variable volume down to 3,000 cfm, integrated controls.
const reference = ["--supply-airflow-min", "3000", "--supply-fan-pressure", "0"];
const results = sites.map(([name, file, map]) => ({
  name,
  integrated: run(file, map, reference),
  nonIntegrated: run(file, map, [...reference, "--non-integrated"]),
  midpoint: run(file, map, [...reference, "--bin-point", "mid"]),
  types: ["single-zone", "variable-volume", "constant-volume-reheat"].map((t) => [t,
    run(file, map, ["--system", t, ...(t === "variable-volume" ? ["--supply-airflow-min", "3000"] : [])])]),
}));

console.log("## Reference system, no fans, integrated, hourly (kBtu of coil energy per year)\n");
console.log("| site | baseline coil | " + controls.map((c) => c.replace("_", "-")).join(" | ") + " |");
for (const r of results) {
  const c = r.integrated.controls;
  console.log(`| ${r.name} | ${n(c.none.coil_total_kbtu)} | ${controls.map((k) => saved(c[k])).join(" | ")} |`);
}

console.log("\n## Prose figures\n");
for (const r of results) {
  const c = r.integrated.controls, ni = r.nonIntegrated.controls;
  const niSavings = [...new Set(controls.map((k) => n(ni[k].savings_kbtu)))].join(" / ");
  const latentAdded = c.differential_drybulb.coil_latent_kbtu - c.none.coil_latent_kbtu;
  const dbShare = c.differential_drybulb.savings_kbtu / c.differential_enthalpy.savings_kbtu;
  const spread = Math.max(...controls.map((k) => c[k].savings_kbtu)) / Math.min(...controls.map((k) => c[k].savings_kbtu)) - 1;
  console.log(`- ${r.name}: non-integrated savings ${niSavings}; differential dry-bulb latent added ${s(latentAdded)};`
    + ` dry-bulb / differential enthalpy ${(100 * dbShare).toFixed(0)} %; largest over smallest savings ${(100 * spread).toFixed(1)} %`);
}

let meanError = 0, midError = 0;
for (const r of results) {
  const e = (d) => {
    const hourly = byMethod(d, "none", "hourly").coil_sensible_kbtu;
    return 100 * (byMethod(d, "none", "bin").coil_sensible_kbtu - hourly) / hourly;
  };
  meanError += Math.abs(e(r.integrated));
  midError += Math.abs(e(r.midpoint));
  console.log(`- ${r.name}: baseline sensible coil, bins against hourly: mean dry-bulb ${pct(e(r.integrated))}, midpoint ${pct(e(r.midpoint))}`);
}
console.log(`- summed absolute error: mean dry-bulb ${meanError.toFixed(1)} points, midpoint ${midError.toFixed(1)} points`);

console.log("\n## Bin method against hourly sum (kBtu saved per year)\n");
console.log("| site | control | hourly | 1-D bins | joint bins | 1-D bins, midpoint |");
const rows = [[0, "differential-drybulb"], [0, "differential-enthalpy"], [1, "differential-drybulb"], [1, "differential-enthalpy"],
  [2, "differential-enthalpy"], [3, "fixed-dewpoint"], [5, "differential-drybulb"]];
for (const [i, control] of rows) {
  const r = results[i];
  const v = (d, m) => s(byMethod(d, control, m).savings_kbtu);
  console.log(`| ${r.name} | ${control} | ${v(r.integrated, "hourly")} | ${v(r.integrated, "bin")} | ${v(r.integrated, "joint-bin")} | ${v(r.midpoint, "bin")} |`);
}

console.log("\n## The three system types, default 3 in. w.g. supply fan (kBtu per year; fans kWh)\n");
console.log("| site | system | baseline coil | reheat | preheat | fans, kWh | differential-drybulb coil saved | differential-enthalpy coil saved | differential-enthalpy reheat and preheat saved |");
console.log("|---|---|---|---|---|---|---|---|---|");
for (const r of results) {
  for (const [t, d] of r.types) {
    const b = d.controls.none, db = d.controls.differential_drybulb, de = d.controls.differential_enthalpy;
    console.log(`| ${r.name} | ${t} | ${n(b.coil_total_kbtu)} | ${n(b.reheat_kbtu)} | ${n(b.preheat_kbtu)} | ${n(b.fans_kwh)} | ${saved(db)} | ${saved(de)} | ${n(de.savings_heating_kbtu)} |`);
  }
}
