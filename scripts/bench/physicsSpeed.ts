/**
 * Timing of the field physics per level: exact solves at the seven build
 * fields, linear validity, and all sublevel transitions with their
 * field-insensitive points. A measuring aid for development, not a test:
 * it checks nothing and its numbers depend on the machine.
 *
 * Columns: one solve; the seven FIELDS; linearValidity; sublevelTransitions
 * solving the seven fields itself ("lines") and reusing them via
 * statesAtFields ("lines+r"); total = solve×7 + validity + lines+r, the
 * per-level analysis of a caller that tabulates those fields anyway.
 * Run: node --import tsx scripts/bench/physicsSpeed.ts [--only NAME] [--repeat N]
 * Profile: node --cpu-prof --import tsx scripts/bench/physicsSpeed.ts
 *
 * The J = I = 9/2 level is a made-up worst case for block width (ten states
 * per M block); its constants only set the scale and are not data.
 */
import { dec } from "../../src/physics/decimal.js";
import { val } from "../../src/physics/constants/constant.js";
import { CODATA_2022 } from "../../src/physics/constants/codata2022.js";
import { hyperfineZeemanSolver, type HyperfineZeemanLevel } from "../../src/physics/field/hyperfineZeeman.js";
import { linearValidity } from "../../src/physics/field/validity.js";
import { sublevelTransitions } from "../../src/physics/field/sublevelTransitions.js";

const muB_h = val(CODATA_2022.muB_h);

// Published constants as in test/physics/field/levels.ts (Steck's Rb and Cs D-line data).
const LEVELS: { name: string; level: HyperfineZeemanLevel }[] = [
  { name: "87Rb 5S1/2", level: { J2: 1, I2: 3, gJ: dec("2.00233113"), gI: dec("-0.0009951414"), A: dec("3417.341305452145e6"), B: dec("0"), muB_h } },
  { name: "87Rb 5P3/2", level: { J2: 3, I2: 3, gJ: dec("1.3362"), gI: dec("-0.0009951414"), A: dec("84.7185e6"), B: dec("12.4965e6"), muB_h } },
  { name: "133Cs 6S1/2", level: { J2: 1, I2: 7, gJ: dec("2.00254032"), gI: dec("-0.00039885395"), A: dec("2298.1579425e6"), B: dec("0"), muB_h } },
  { name: "133Cs 6P3/2", level: { J2: 3, I2: 7, gJ: dec("1.334"), gI: dec("-0.00039885395"), A: dec("50.28827e6"), B: dec("-0.4934e6"), muB_h } },
  { name: "J=I=9/2 (made up)", level: { J2: 9, I2: 9, gJ: dec("1.2"), gI: dec("-0.0003"), A: dec("-120e6"), B: dec("40e6"), muB_h } },
];

const FIELDS = ["0", "1e-4", "1e-3", "0.01", "0.1", "1", "10"].map(dec);

const args = process.argv.slice(2);
const only = args.includes("--only") ? args[args.indexOf("--only") + 1] : undefined;
const repeat = args.includes("--repeat") ? Number(args[args.indexOf("--repeat") + 1]) : 1;

/** CPU time of f in ms (user + system of this process), which other load on the machine disturbs less than wall time. */
function time<T>(f: () => T): [T, number] {
  const t0 = process.cpuUsage();
  const r = f();
  const d = process.cpuUsage(t0);
  return [r, (d.user + d.system) / 1000];
}

const ms = (x: number) => x.toFixed(1).padStart(10);
const heads = ["solve×1", "solve×7", "validity", "lines", "lines+r", "total+r"];
console.log(`${"level".padEnd(20)}${heads.map((h) => h.padStart(10)).join("")}  lines  insensitive points`);
for (const { name, level } of LEVELS) {
  if (only && !name.includes(only)) continue;
  for (let r = 0; r < repeat; r++) {
    const solve = hyperfineZeemanSolver(level);
    const [, one] = time(() => solve(dec("0.0123")));
    const [states, seven] = time(() => FIELDS.map((b) => solve(b)));
    const [, validity] = time(() => linearValidity(level));
    const [lines, trans] = time(() => sublevelTransitions(level, FIELDS));
    // as a caller that tabulates the seven fields anyway would call it
    const [, reuse] = time(() => sublevelTransitions(level, FIELDS, { statesAtFields: states }));
    const points = lines.reduce((n, l) => n + l.fieldInsensitive.length, 0);
    console.log(`${name.padEnd(20)}${[one, seven, validity, trans, reuse, seven + validity + reuse].map(ms).join("")}  ${String(lines.length).padStart(5)}  ${points}`);
  }
}
console.log("CPU times in ms");
