/**
 * Units the data files may use, and their exact factors to the SI unit of
 * their kind, as decimal text. Every factor is exact by definition
 * (1 G = 1e-4 T; 1 cm⁻¹ corresponds to 100·c Hz with c = 299 792 458 m/s
 * exact in the SI). No imports: the page scripts bundle it (src/browser/).
 */
export type UnitKind = "frequency" | "field" | "length" | "mass";

export interface UnitDef {
  readonly kind: UnitKind;
  /** Factor to Hz, T, m or u. */
  readonly factor: string;
}

/** The speed of light in m/s, exact in the SI. */
export const SPEED_OF_LIGHT_TEXT = "299792458";
const C = SPEED_OF_LIGHT_TEXT;

export const UNITS: Readonly<Record<string, UnitDef>> = Object.freeze({
  Hz: { kind: "frequency", factor: "1" },
  kHz: { kind: "frequency", factor: "1e3" },
  MHz: { kind: "frequency", factor: "1e6" },
  GHz: { kind: "frequency", factor: "1e9" },
  THz: { kind: "frequency", factor: "1e12" },
  "cm-1": { kind: "frequency", factor: `${C}e2` },
  "cm^-1": { kind: "frequency", factor: `${C}e2` },
  "cm⁻¹": { kind: "frequency", factor: `${C}e2` },
  T: { kind: "field", factor: "1" },
  mT: { kind: "field", factor: "1e-3" },
  "µT": { kind: "field", factor: "1e-6" },
  uT: { kind: "field", factor: "1e-6" },
  G: { kind: "field", factor: "1e-4" },
  mG: { kind: "field", factor: "1e-7" },
  kG: { kind: "field", factor: "1e-1" },
  m: { kind: "length", factor: "1" },
  "µm": { kind: "length", factor: "1e-6" },
  um: { kind: "length", factor: "1e-6" },
  nm: { kind: "length", factor: "1e-9" },
  pm: { kind: "length", factor: "1e-12" },
  "Å": { kind: "length", factor: "1e-10" },
  A: { kind: "length", factor: "1e-10" },
  u: { kind: "mass", factor: "1" },
  Da: { kind: "mass", factor: "1" },
});

/** The units of one kind, for error hints. */
export function unitsOfKind(kind: UnitKind): string[] {
  return Object.entries(UNITS)
    .filter(([, d]) => d.kind === kind)
    .map(([u]) => u);
}
