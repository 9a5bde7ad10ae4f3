import { describe, expect, it } from "vitest";
import { dec } from "../../src/physics/decimal.js";
import { formatUncertain } from "../../src/site/format.js";
import { uncertainProseHtml } from "../../src/site/uncertainProse.js";
import { atlasFilters } from "../../src/site/filters.js";

describe("uncertainties inside sentences", () => {
  it("puts a concise uncertainty in its own element the page's switch hides", () => {
    // GUM (JCGM 100:2008) §7.2.2, form (2): the uncertainty in parentheses after the value's last digit
    const text = `G = ${formatUncertain(dec("1.3403882"), dec("0.0012"))} from the g values in use`;
    // value to the uncertainty's last place, 10⁻⁴ (four decimals stay ungrouped)
    expect(uncertainProseHtml(text)).toBe('G = 1.3404<span class="unc unc-prose">(12)</span> from the g values in use');
  });

  it("leaves formulas' parentheses alone and escapes the text as autoescaping does", () => {
    const formula = "s = J_u(J_u+1) + J_l(J_l+1), (2·|g_eff|) < 3 & J = 0 (textbook)";
    expect(uncertainProseHtml(formula)).toBe("s = J_u(J_u+1) + J_l(J_l+1), (2·|g_eff|) &lt; 3 &amp; J = 0 (textbook)");
  });

  it("marks every uncertainty of a sentence, also before a power of ten, and is the templates' filter", () => {
    const two = `${formatUncertain(dec("28.42"), dec("0.11"))} pm/T and ${formatUncertain(dec("1.2345e-9"), dec("2.1e-12"))} m`;
    expect(atlasFilters.uncertainProse(two).match(/class="unc unc-prose">\(\d+\)</g)).toHaveLength(2);
    expect(atlasFilters.uncertainProse(two)).toContain("(21)</span>×10⁻⁹");
  });
});
