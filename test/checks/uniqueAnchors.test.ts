import { describe, expect, it } from "vitest";
import { checkUniqueAnchors, pageIds } from "../../src/checks/uniqueAnchors.js";

describe("the unique-anchor check", () => {
  it("accepts a page whose ids differ", () => {
    expect(checkUniqueAnchors(`<h2 id="levels">x</h2><tr id="level:5s"><td id='b'>`, "p.html")).toEqual([]);
  });

  it("reports an id used twice, once", () => {
    const html = `<tr id="row:1"></tr><tr id="row:2"></tr><tr id="row:1"></tr><tr id="row:1"></tr>`;
    expect(checkUniqueAnchors(html, "species/rb87/index.html")).toEqual(['species/rb87/index.html: id "row:1" appears more than once']);
  });

  it("compares ids after decoding character references", () => {
    expect(checkUniqueAnchors(`<a id="5p-P3&#47;2"></a><a id="5p-P3/2"></a>`, "p.html")).toEqual(['p.html: id "5p-P3/2" appears more than once']);
  });

  it("ignores ids inside comments, scripts, styles and other attribute values", () => {
    const html = `<!-- <p id="a"> --><script>document.write('<p id="a">')</script><style>/* id="a" */</style><p title='id="a"' id="a"></p>`;
    expect(pageIds(html)).toEqual(["a"]);
    expect(checkUniqueAnchors(html, "p.html")).toEqual([]);
  });

  it("reads unquoted and single-quoted ids, any case of the attribute name", () => {
    expect(pageIds(`<p ID=x><p id='y'><p data-id="z" id = "w">`)).toEqual(["x", "y", "w"]);
  });
});
