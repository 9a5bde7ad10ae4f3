import { createRequire } from "node:module";
import { describe, expect, it } from "vitest";
import { dec } from "../../src/physics/decimal.js";
import { Rational } from "../../src/physics/rational.js";
import { sortKey } from "../../src/site/sortKey.js";
import { alignTable, fractionCell, numberCell, quantumCell, termCell, textCell, uncertainCell, type Cell, type ColumnKind, type Table } from "../../src/site/table.js";
import { escapeHtml, tableRowsHtml } from "../../src/site/tableRows.js";

// nunjucks ships no types; the two entry points used here, typed locally.
interface NunjucksLike {
  Environment: new (loader: null, opts: { autoescape: boolean }) => {
    addFilter(name: string, fn: (...args: never[]) => unknown): void;
    renderString(src: string, ctx: object): string;
  };
  lib: { escape(s: string): string };
}
const nunjucks = createRequire(import.meta.url)("nunjucks") as NunjucksLike;

// The Nunjucks loop the rows used to be rendered by (templates/_includes/macros.njk before
// src/site/tableRows.ts), kept here as the reference the TypeScript must match byte for byte.
const MACROS = `{% macro term(t) -%}
<span class="term"><sup>{{ t.multiplicity }}</sup>{{ t.letter }}{% if t.parity %}<sup>o</sup>{% endif %}<sub>{{ t.J }}</sub></span>
{%- endmacro %}
{% macro cell(c, col) -%}
{%- if col.kind == "term" and c.term -%}{{ term(c.term) }}
{%- elif c.href -%}<a href="{{ c.href }}">{{ c.text }}</a>
{%- elif c.parts -%}{% if c.fraction %}<span class="q">{{ c.fraction.text }}</span> {{ c.fraction.rel }} {% endif %}<span class="n">{{ c.parts.sign }}{{ c.parts.int }}<span class="frac">{{ c.parts.frac }}{% if c.parts.unc %}<span class="unc">{{ c.parts.unc }}</span>{% endif %}{{ c.parts.exp }}</span>{% if c.parts.pad %}<span class="pad">{{ c.parts.pad }}</span>{% endif %}</span>
{%- else -%}{{ c.text }}
{%- endif -%}
{%- endmacro %}
<tbody>
{%- for r in t.rows %}
<tr id="{{ r.anchor }}">
{%- for c in r.cells %}{% set col = t.columns[loop.index0] %}{% set key = c | sortKey(col.kind) %}<td class="k-{{ col.kind }}"{% if key !== false %} data-sort="{{ key }}"{% endif %}{% if c.hzPerT %} data-hz-per-t="{{ c.hzPerT }}"{% endif %}{% if c.uHzPerT %} data-u-hz-per-t="{{ c.uHzPerT }}"{% endif %}>{{ cell(c, col) }}</td>{% endfor -%}
<td class="k-link"><a class="row-link" href="#{{ r.anchor }}" aria-label="Link to this row">#</a></td>
</tr>
{%- endfor %}
</tbody>`;

function viaNunjucks(t: Table): string {
  const env = new nunjucks.Environment(null, { autoescape: true });
  env.addFilter("sortKey", (c: Cell, kind: ColumnKind) => sortKey(c, kind));
  const html = env.renderString(MACROS, { t });
  return html.slice(html.indexOf("<tbody>"));
}

const table: Table = alignTable({
  id: "t",
  caption: "c",
  csvPath: "t.csv",
  columns: [
    { key: "a", label: "A", kind: "text" },
    { key: "t", label: "Term", kind: "term" },
    { key: "m", label: "m", kind: "quantum" },
    { key: "g", label: "g", kind: "fraction" },
    { key: "s", label: "shift", kind: "number", switchable: true },
  ],
  rows: [
    {
      anchor: `level:5p-P3/2:it's&<"x">`,
      cells: [
        textCell(`Steck, "Rb 87" <rev> a\\b & c`, "#level:5p"),
        termCell({ text: "2Po3/2", multiplicity: 2, letter: "P", parity: "odd", J2: 3 }),
        quantumCell(-3, true),
        fractionCell(Rational.of(4n, 3n)),
        uncertainCell(dec("-1399624.49171"), dec("0.0021"), 9, { hzPerT: "-13996244917.1" }, dec("21")),
      ],
    },
    {
      anchor: "level:5s",
      cells: [textCell("F=1, mF=\u22121"), termCell({ text: "2S1/2", multiplicity: 2, letter: "S", parity: null, J2: 1 }), quantumCell(1, true), fractionCell(null), numberCell(null)],
    },
  ],
});

describe("tableRowsHtml", () => {
  it("writes the same rows, byte for byte, as the Nunjucks macro it replaces", () => {
    const ours = "<tbody>" + tableRowsHtml(table) + "\n</tbody>";
    expect(ours).toBe(viaNunjucks(table));
    expect(ours).toContain("&quot;Rb 87&quot; &lt;rev&gt; a&#92;b &amp; c");
  });

  it("writes a computed number's uncertainty as its own element and its Hz/T uncertainty as an attribute", () => {
    const ours = tableRowsHtml(table);
    // -1399624.49171 with u = 0.0021 (two significant digits, common practice) → −1 399 624.4917(21) (four fraction digits stay together)
    expect(ours).toContain(`<span class="frac">.4917<span class="unc">(21)</span></span>`);
    expect(ours).toContain(`data-u-hz-per-t="21"`);
  });

  it("escapes the six characters Nunjucks escapes, as Nunjucks does", () => {
    const s = `<a href="x">'&\\</a> plain`;
    expect(escapeHtml(s)).toBe(nunjucks.lib.escape(s));
  });
});
