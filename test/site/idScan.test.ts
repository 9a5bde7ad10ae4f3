import { describe, expect, it } from "vitest";
import { decodeAttribute, pageIds, scanIds, startTags } from "../../src/site/idScan.js";

describe("scanIds", () => {
  it("finds ids in double, single and unquoted attributes, in any case", () => {
    const html = `<p id="a"></p><div ID='b' class=x></div><span id=c>t</span><td class="n" id="level:5s-S1/2:F=2:mF=-1">`;
    expect(scanIds(html)).toEqual(["a", "b", "c", "level:5s-S1/2:F=2:mF=-1"]);
  });

  it("decodes character references, so an escaped id reads as the browser reads it", () => {
    expect(scanIds(`<tr id="line:a&amp;b"></tr><tr id="x&#39;y&#x2F;z"></tr>`)).toEqual(["line:a&b", "x'y/z"]);
    expect(decodeAttribute("&lt;&gt;&quot;&unknown;")).toBe(`<>"&unknown;`);
  });

  it("ignores ids in comments, scripts and styles and inside other attribute values", () => {
    const html = `<!-- <p id="c1"> --><script>var s = '<p id="s1">';</script><style>#x{}</style><a title='<b id="t1">' id="real">`;
    expect(scanIds(html)).toEqual(["real"]);
  });

  it("reads a > inside a quoted value as part of the value", () => {
    const tags = startTags(`<a title="1 > 0" id="after">x</a>`);
    expect(tags[0]?.attrs.get("id")).toBe("after");
    expect(tags[0]?.attrs.get("title")).toBe("1 > 0");
  });

  it("ends a script or style only at its own end tag, in any case (HTML raw-text rule)", () => {
    const html = `<script>if (a</b) x = "<p id='s1'>";</scripts><p id="s2"></SCRIPT ><p id="after"><STYLE>p{}</style><p id="late">`;
    expect(scanIds(html)).toEqual(["after", "late"]);
  });

  it("skips the doctype, processing instructions and end tags, and reads an unterminated page to its end", () => {
    expect(scanIds(`<!DOCTYPE html><?x id="p"?></p id="e"><p id="ok"><p id="cut`)).toEqual(["cut", "ok"]);
  });

  it("takes the first id of a tag, as a browser does", () => {
    expect(pageIds(`<p id="first" ID="second"><p id=third>`)).toEqual(["first", "third"]);
  });

  it("lists a repeated id once and skips empty ids", () => {
    expect(scanIds(`<p id="b"></p><p id="a"></p><p id="b"></p><p id=""></p>`)).toEqual(["a", "b"]);
  });

  it("sorts by code point, independent of locale", () => {
    expect(scanIds(`<p id="b"></p><p id="B"></p><p id="a"></p><p id="Ä"></p>`)).toEqual(["B", "a", "b", "Ä"]);
  });
});
