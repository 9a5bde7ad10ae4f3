/**
 * Summarize a V8 CPU profile (`node --cpu-prof`, e.g. from `npm run bench --
 * --profile`): self time by function and by source file, largest first.
 * Run: node --import tsx scripts/bench/profileTop.ts bench-profile/CPU.….cpuprofile [N]
 */
import { readFileSync } from "node:fs";

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
}
interface Profile {
  nodes: ProfileNode[];
  samples: number[];
  timeDeltas: number[];
}

const [file, nArg] = process.argv.slice(2);
if (!file) throw new Error("give a .cpuprofile file");
const p = JSON.parse(readFileSync(file, "utf8")) as Profile;
const byId = new Map(p.nodes.map((n) => [n.id, n]));
const self = new Map<number, number>();
p.samples.forEach((id, i) => self.set(id, (self.get(id) ?? 0) + (p.timeDeltas[i] ?? 0)));
const total = [...self.values()].reduce((a, b) => a + b, 0);

const short = (url: string): string => {
  const u = url.replace(/^file:\/\//, "");
  return u.includes("/node_modules/") ? u.replace(/^.*\/node_modules\//, "npm:") : u.replace(/^.*\/(src|templates|scripts)\//, "$1/");
};
const fn = new Map<string, number>();
const files = new Map<string, number>();
for (const [id, us] of self) {
  const n = byId.get(id)!;
  const where = short(n.callFrame.url) || "(native)";
  const key = `${n.callFrame.functionName || "(anonymous)"}  ${where}:${n.callFrame.lineNumber + 1}`;
  fn.set(key, (fn.get(key) ?? 0) + us);
  const f = where.startsWith("npm:") ? where.split("/").slice(0, where.startsWith("npm:@") ? 2 : 1).join("/") : where;
  files.set(f, (files.get(f) ?? 0) + us);
}
const top = Number(nArg ?? 25);
const show = (title: string, m: Map<string, number>): void => {
  process.stdout.write(`${title} (total ${(total / 1e6).toFixed(2)} s)\n`);
  for (const [k, us] of [...m].sort((a, b) => b[1] - a[1]).slice(0, top)) {
    process.stdout.write(`${(us / 1e6).toFixed(2).padStart(8)} s ${((100 * us) / total).toFixed(1).padStart(5)} %  ${k}\n`);
  }
};
// Inclusive time of our own functions (src/…): every sample counts once for each distinct one on its stack.
const parent = new Map<number, number>();
for (const n of p.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
const inclusive = new Map<string, number>();
p.samples.forEach((id, i) => {
  const seen = new Set<string>();
  for (let at: number | undefined = id; at !== undefined; at = parent.get(at)) {
    const n = byId.get(at)!;
    const where = short(n.callFrame.url);
    if (!where.startsWith("src/")) continue;
    seen.add(`${n.callFrame.functionName || "(anonymous)"}  ${where}`);
  }
  for (const k of seen) inclusive.set(k, (inclusive.get(k) ?? 0) + (p.timeDeltas[i] ?? 0));
});
show("self time by function", fn);
show("self time by file or package", files);
show("inclusive time of src/ functions", inclusive);
