import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { exactDifference, exactText, offsetFrom } from "../../src/site/lockOffsets.js";
import { partsText } from "../../src/site/plainFormat.js";

const shown = (a: string, b: string) => partsText(offsetFrom(a, b)!.parts);
/** The same with decimal.js, a general-purpose library: (a − b)/10⁶ to 3 places, half to even, in the site's number style. */
function reference(a: string, b: string): string {
  const x = new Dec(a).sub(b).div("1e6").toDecimalPlaces(3, Dec.ROUND_HALF_EVEN);
  if (x.isZero()) return "0";
  const [int, frac] = x.abs().toFixed(3).split(".");
  const group = (d: string, left: boolean) => {
    if (d.length <= 4) return d;
    const out: string[] = [];
    if (left) for (let i = 0; i < d.length; i += 3) out.push(d.slice(i, i + 3));
    else for (let i = d.length; i > 0; i -= 3) out.unshift(d.slice(Math.max(0, i - 3), i));
    return out.join("\u2009");
  };
  return (x.isNegative() ? "\u2212" : "") + group(int!, false) + "." + group(frac!, true);
}

describe("lock-point offsets", () => {
  it("subtract exactly, digit for digit, as decimal.js does", () => {
    const a = "384228115203347.458037654937781";
    const b = "384227981877347.458037654937781";
    expect(exactText(exactDifference(a, b)!)).toBe(new Dec(a).sub(b).toFixed());
    expect(exactText(exactDifference(b, a)!)).toBe(new Dec(b).sub(a).toFixed());
    expect(exactText(exactDifference("1e3", "0.0005")!)).toBe("999.9995");
    expect(exactDifference("abc", "1")).toBeNull();
  });

  it("show MHz to 1 kHz, rounding half to even as decimal.js does", () => {
    const samples: [string, string][] = [
      ["133325500", "0"], // 133.3255 → 133.326 (tie, to even)
      ["133324500", "0"], // 133.3245 → 133.324
      ["-400", "0"], // below 0.5 kHz: 0, without a minus
      ["0", "0"],
      ["384228115203347.458037654937781", "384234683234347.458037654937781"],
      ["384231108952097.458", "384228115203347.458037654937781"],
      ["999999.5", "0"],
      ["12345678901.2345", "0"],
    ];
    for (const [a, b] of samples) expect(shown(a, b), `${a} − ${b}`).toBe(reference(a, b));
  });

  it("keep an exact sort key in MHz", () => {
    expect(offsetFrom("133325500", "0")!.sort).toBe("133.3255");
    expect(offsetFrom("0", "133325500.25")!.sort).toBe("-133.32550025");
    expect(offsetFrom("5", "5")!.sort).toBe("0");
  });
});
