import { describe, expect, it } from "vitest";
import { publicBase } from "../../src/site/publicBase.js";

// common practice: a site hosted under a path prefix is addressed as host + prefix.
describe("publicBase", () => {
  it("joins a bare host with the path prefix", () => {
    expect(publicBase("https://lab.example", "/atlas/")).toBe("https://lab.example/atlas/");
  });
  it("does not repeat a prefix the site URL already ends in", () => {
    expect(publicBase("https://lab.example/atlas/", "/atlas/")).toBe("https://lab.example/atlas/");
  });
  it("keeps a site URL with its own path when the prefix is the root", () => {
    expect(publicBase("https://lab.example/wiki/atlas", "/")).toBe("https://lab.example/wiki/atlas/");
  });
  it("is null without a site URL", () => {
    expect(publicBase(null, "/atlas/")).toBeNull();
  });
});
