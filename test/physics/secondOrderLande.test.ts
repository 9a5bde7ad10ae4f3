import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { landeExact } from "../../src/physics/lande.js";
import { effectiveLande, lineComponents } from "../../src/physics/linePattern.js";
import { Rational } from "../../src/physics/rational.js";
import { secondOrderLande, secondOrderLandeExact, secondOrderLandeSlopes } from "../../src/physics/secondOrderLande.js";

interface GRow {
  Ju2: number;
  Jl2: number;
  G: { gu2: string; gugl: string; gl2: string };
  g_eff: { gu: string; gl: string };
}

// Source: sympy 1.14, the direct sum over the Zeeman components (scripts/fixtures/angular_sympy.py).
const fixture = JSON.parse(readFileSync(new URL("../fixtures/angular-sympy.json", import.meta.url), "utf-8")) as { G: GRow[] };

const MUB_H = new Dec("13996244917.1"); // CODATA 2022, Hz/T

function ls(S2: number, L: number, J2: number) {
  const g = landeExact(S2, L, J2);
  return { J2, g, gDec: g ? g.toDecimal() : null };
}

describe("secondOrderLandeExact", () => {
  it("repeats its worked example: Fe I 525.02 nm has G = 9 and 630.25 nm G = 25/4", () => {
    // textbook: one J = 0 level gives G = g_eff² (Landi Degl'Innocenti and Landolfi 2004);
    // g_eff 3 and 5/2 (Solanki, Space Sci. Rev. 63, 1 (1993))
    expect(secondOrderLandeExact(ls(6, 2, 2), ls(4, 2, 0)).toString()).toBe("9");
    expect(secondOrderLandeExact(ls(4, 2, 0), ls(4, 1, 2)).toString()).toBe("25/4");
  });

  it("repeats its worked example: Na D2 has G = 4/3", () => {
    // by hand from the components (3/2→1/2: shift 1, strength 1/4; 1/2→−1/2: 5/3, 1/12; π ±1/3, 1/6):
    // (1/4·1 + 1/12·25/9)·3 − 1/9 = 13/9 − 1/9 = 4/3
    expect(secondOrderLandeExact(ls(1, 1, 3), ls(1, 0, 1)).toString()).toBe("4/3");
  });

  it("equals sympy's direct sum over the components for fourteen (J_u, J_l) pairs and any g values", () => {
    expect(fixture.G).toHaveLength(14);
    // three independent (g_u, g_l) pairs fix a quadratic form in g_u, g_l
    const gs: [Rational, Rational][] = [
      [Rational.of(1), Rational.ZERO],
      [Rational.ZERO, Rational.of(1)],
      [Rational.of(3, 2), Rational.of(-2, 7)],
      [Rational.of(5, 3), Rational.of(11, 4)],
    ];
    for (const row of fixture.G) {
      for (const [gu, gl] of gs) {
        const want = Rational.parse(row.G.gu2).mul(gu).mul(gu).add(Rational.parse(row.G.gugl).mul(gu).mul(gl)).add(Rational.parse(row.G.gl2).mul(gl).mul(gl));
        const upper = { J2: row.Ju2, g: row.Ju2 === 0 ? null : gu };
        const lower = { J2: row.Jl2, g: row.Jl2 === 0 ? null : gl };
        if (row.Ju2 === 0 || row.Jl2 === 0) {
          // a J = 0 level has no g; the sum then does not depend on it
          const other = row.Ju2 === 0 ? Rational.parse(row.G.gl2).mul(gl).mul(gl) : Rational.parse(row.G.gu2).mul(gu).mul(gu);
          expect(secondOrderLandeExact(upper, lower).toString(), `${row.Ju2}/2 → ${row.Jl2}/2`).toBe(other.toString());
        } else {
          expect(secondOrderLandeExact(upper, lower).toString(), `${row.Ju2}/2 → ${row.Jl2}/2`).toBe(want.toString());
        }
      }
    }
  });

  it("is the second moment of the line's own components (σ mean square minus π mean square)", () => {
    // definition (Landi Degl'Innocenti and Landolfi 2004, ch. 9, from memory); components from lineComponents
    const pairs: [ReturnType<typeof ls>, ReturnType<typeof ls>][] = [
      [ls(2, 1, 4), ls(2, 2, 6)], // 3P2 → 3D3
      [ls(4, 3, 4), ls(4, 2, 2)], // 5F2 → 5D1
      [ls(1, 1, 3), ls(1, 2, 5)], // 2P3/2 → 2D5/2
    ];
    for (const [u, l] of pairs) {
      const cs = lineComponents({ J2: u.J2, g: u.gDec, gExact: u.g }, { J2: l.J2, g: l.gDec, gExact: l.g }, 1, MUB_H);
      const mean = (q: number) => {
        let s = Rational.ZERO;
        let s2 = Rational.ZERO;
        for (const c of cs.filter((c) => c.deltaM === q)) {
          s = s.add(c.strength);
          s2 = s2.add(c.strength.mul(c.shiftLorentzExact).mul(c.shiftLorentzExact));
        }
        return s2.div(s);
      };
      const direct = mean(1).add(mean(-1)).div(Rational.of(2)).sub(mean(0));
      expect(secondOrderLandeExact({ J2: u.J2, g: u.g }, { J2: l.J2, g: l.g }).toString()).toBe(direct.toString());
    }
  });
});

describe("secondOrderLande", () => {
  it("equals g_eff² with a measured g and a J = 0 level", () => {
    // textbook: δ = 0 when one level has J = 0; measured-style g 2.4993 (invented input)
    const up = { J2: 2, g: new Dec("2.4993") };
    const lo = { J2: 0, g: null };
    const geff = effectiveLande(up, lo);
    expect(secondOrderLande(up, lo).toString()).toBe(geff.mul(geff).toString());
    expect(secondOrderLande(up, lo).toString()).toBe("6.24650049"); // 2.4993² by hand
  });

  it("gives the exact value's decimal with LS g values (Na D2: 4/3)", () => {
    // by hand, as above
    const v = secondOrderLande({ J2: 3, g: new Dec(4).div(3) }, { J2: 1, g: new Dec(2) });
    expect(v.toSignificantDigits(40).eq(new Dec(4).div(3).toSignificantDigits(40))).toBe(true);
  });
});

describe("secondOrderLandeSlopes", () => {
  const exactly = (x: Dec, r: Rational) => expect(x.toSignificantDigits(40).eq(r.toDecimal().toSignificantDigits(40)), `${x} vs ${r}`).toBe(true);

  it("repeats its worked example: Na D2 has ∂G/∂g_u = 3 and ∂G/∂g_l = −2/3", () => {
    // by hand from G = ḡ² − δ (Landi Degl'Innocenti and Landolfi 2004): d = 3, s = 9/2, K = 5, ḡ = 7/6
    const s = secondOrderLandeSlopes({ J2: 3, g: new Dec(4).div(3) }, { J2: 1, g: new Dec(2) });
    exactly(s.dGdgu, Rational.of(3));
    exactly(s.dGdgl, Rational.of(-2, 3));
  });

  it("gives 2·g_u and 0 for a line to a J = 0 level (Fe I 525.02 nm, g_u = 3), where G = g_u²", () => {
    // textbook: G = g_eff² = g_u² when the lower level has J = 0, so dG/dg_u = 2·g_u
    const s = secondOrderLandeSlopes({ J2: 2, g: new Dec(3) }, { J2: 0, g: null });
    exactly(s.dGdgu, Rational.of(6));
    exactly(s.dGdgl, Rational.ZERO);
  });

  it("equals the derivatives of sympy's quadratic form for fourteen (J_u, J_l) pairs", () => {
    // sympy's direct sum gives G = a·g_u² + b·g_u·g_l + c·g_l², so ∂G/∂g_u = 2a·g_u + b·g_l and ∂G/∂g_l = b·g_u + 2c·g_l
    const gs: [Rational, Rational][] = [
      [Rational.of(3, 2), Rational.of(-2, 7)],
      [Rational.of(5, 3), Rational.of(11, 4)],
    ];
    for (const row of fixture.G.filter((r) => r.Ju2 > 0 && r.Jl2 > 0)) {
      const a = Rational.parse(row.G.gu2);
      const b = Rational.parse(row.G.gugl);
      const c = Rational.parse(row.G.gl2);
      for (const [gu, gl] of gs) {
        const s = secondOrderLandeSlopes({ J2: row.Ju2, g: gu.toDecimal() }, { J2: row.Jl2, g: gl.toDecimal() });
        exactly(s.dGdgu, a.mul(Rational.of(2)).mul(gu).add(b.mul(gl)));
        exactly(s.dGdgl, b.mul(gu).add(c.mul(Rational.of(2)).mul(gl)));
      }
    }
  });
});
