import { describe, expect, it } from "vitest";
import { rewriteRootLinks } from "../../src/site/rewriteRootLinks.js";

// Expected paths follow relative-reference resolution (RFC 3986 §5.2): each
// result, resolved against the page URL, names the same file as the original.
describe("rewriteRootLinks", () => {
  it("makes site-root href and src values relative to the page", () => {
    const html = '<a href="/species/rb87/#line:D2">D2</a><img src="/assets/x.svg" alt="">';
    expect(rewriteRootLinks(html, "/species/sr88/")).toBe(
      '<a href="../rb87/index.html#line:D2">D2</a><img src="../../assets/x.svg" alt="">', // RFC 3986 §5.2
    );
  });

  it("leaves protocol-relative, fragment, scheme and mailto links alone", () => {
    const html = '<a href="//host/x">a</a><a href="#row">b</a><a href="https://x/y">c</a><a href="mailto:a@b">d</a>';
    expect(rewriteRootLinks(html, "/species/rb87/")).toBe(html);
  });

  it("touches only href and src attributes, not other attributes or escaped text that holds a path", () => {
    // Autoescaping writes a quote in text as &quot;, so text never holds href="/…".
    const html = '<p data-root="/x/">see href=&quot;/y&quot;</p><link rel="stylesheet" href="/assets/atlas.css">';
    expect(rewriteRootLinks(html, "/")).toBe('<p data-root="/x/">see href=&quot;/y&quot;</p><link rel="stylesheet" href="assets/atlas.css">'); // RFC 3986 §5.2
  });

  it("spells out index.html for the site root and for directory links", () => {
    expect(rewriteRootLinks('<a href="/">home</a>', "/methods/")).toBe('<a href="../index.html">home</a>'); // RFC 3986 §5.2
    expect(rewriteRootLinks('<a\nhref="/methods/">m</a>', "/")).toBe('<a\nhref="methods/index.html">m</a>'); // RFC 3986 §5.2
  });
});
