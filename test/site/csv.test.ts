import { describe, expect, it } from "vitest";
import { tableCsv } from "../../src/site/csv.js";
import { dec } from "../../src/physics/decimal.js";
import { numberCell, textCell, type Table } from "../../src/site/table.js";

const table = (rows: Table["rows"]): Table => ({
  id: "t",
  caption: "t",
  csvPath: "t.csv",
  columns: [
    { key: "name", label: "name, as written", kind: "text" },
    { key: "x", label: "x", unit: "MHz/G", kind: "number" },
  ],
  rows,
});

describe("tableCsv (RFC 4180)", () => {
  it("quotes fields with commas, quotes and line breaks, doubling quotes, with CRLF records", () => {
    const csv = tableCsv(
      table([
        { anchor: "a", cells: [textCell('say "hi", twice'), numberCell(dec("1.5"))] },
        { anchor: "b", cells: [textCell("two\nlines"), numberCell(dec("-2"))] },
        { anchor: "c", cells: [textCell("cr\rhere"), numberCell(null)] },
      ]),
    );
    // RFC 4180 §2: CRLF line ends; fields containing comma, quote, CR or LF are quoted; quotes doubled.
    expect(csv).toBe(
      'anchor,"name, as written",x (MHz/G)\r\n' + 'a,"say ""hi"", twice",1.5\r\n' + 'b,"two\nlines",-2\r\n' + 'c,"cr\rhere",\r\n',
    );
  });

  it("writes numbers at full precision with an ASCII minus, not as shown", () => {
    const csv = tableCsv(table([{ anchor: "a", cells: [textCell("−1/2"), numberCell(dec("-1234567.891234567"), 4)] }]));
    expect(csv.split("\r\n")[1]).toBe("a,-1/2,-1234567.891234567");
  });
});
