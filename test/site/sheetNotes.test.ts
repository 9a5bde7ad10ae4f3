/**
 * Issue 11 §1 on the bench sheets: the field-dependent notes (zero-field
 * hyperfine splittings, field-insensitive transitions with their field,
 * frequency and second-order coefficient) carry their standard
 * uncertainties in the concise form where that fits, from the demo's 87Rb.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { Dec } from "../../src/physics/decimal.js";
import { noteNumber, sheetNotes } from "../../src/site/sheet.js";
import { computeFrom } from "../results/speciesFrom.js";

const plain = (s: string) => s.replaceAll("\u2009", "").replaceAll("\u2212", "-");
const rb = computeFrom(readFileSync("data/species/rb87.yaml", "utf8"), ["0 G", "3.23 G"]);
const notes = sheetNotes(rb.result, rb.fields, new Dec("0.001"));

describe("bench-sheet notes with uncertainties (87Rb)", () => {
  it("give the 5²P1/2 clock line its frequency 2A′ with u = 2u(A′) = 30 kHz and its second-order coefficient with u(β)/β = u(A′)/A′", () => {
    const line = notes.insensitive.map(plain).find((t) => t.startsWith("5p-P1/2 |1, 0⟩↔|2, 0⟩"))!;
    // A(5²P1/2) = 408.328(15) MHz (Steck, from memory): 2A = 816.656(30) MHz;
    // β = (gJ − gI)²(μB/h)²/(2·2A) ∝ 1/A (Breit–Rabi expanded, textbook), so u(β) = β·15/408328 = 533.396·3.67e−5 = 0.020 Hz/G²
    expect(line).toMatch(/: 0 G, 816\.656\(30\) MHz, 533\.\d+\(20\) Hz\/G² at 0 G$/);
  });

  it("give the 5²P3/2 splitting F′ = 2 ↔ 3 as 266.650 1(46) MHz: 3A′ + B′ with u = √((3u(A′))² + u(B′)²) = 6.9 kHz (hand formula)", () => {
    const p32 = plain(notes.splittings.find((s) => s.startsWith("5p-P3/2"))!);
    // E(F′=3) − E(F′=2) = 3A′ + B′ (Casimir formula, textbook): 3·84.7185 + 12.4965 = 266.652 MHz (Steck: 266.650(9) MHz, from memory);
    // u = √(6.0² + 3.7²) kHz = 7.0 kHz with u(A′) = 2.0 kHz, u(B′) = 3.7 kHz (Steck, from memory)
    expect(p32).toMatch(/2↔3 266\.6520\(70\)/);
  });

  it("keep a number whose uncertainty lies far below its last digit at its usual digits (the ground-state splitting 2A)", () => {
    const s12 = plain(notes.splittings.find((s) => s.startsWith("5s-S1/2"))!);
    // 6834.682 610 904 MHz = 2A (Steck); u = 2·45 µHz, far below 1 Hz
    expect(s12).toBe("5s-S1/2: 1↔2 6834.68261 MHz");
  });

  it("noteNumber falls back to the plain digits when the concise form would need more than the allowed digits", () => {
    expect(plain(noteNumber(new Dec("1.23456789"), new Dec("0.0012"), 5))).toBe("1.2346(12)");
    expect(plain(noteNumber(new Dec("1.23456789"), new Dec("0.00000012"), 5))).toBe("1.2346");
    expect(plain(noteNumber(new Dec("1.23456789"), null, 5))).toBe("1.2346");
    // a field-insensitive point (3.228 917 0(33) G needs 8 digits) keeps its uncertainty with a larger allowance
    // (u = 3.3e−10 T = 3.3 µG: test/fixtures/field/uncertainty-mc.json, numpy Monte Carlo)
    expect(plain(noteNumber(new Dec("3.22891702"), new Dec("0.0000033"), 5, 9))).toBe("3.2289170(33)");
  });
});
