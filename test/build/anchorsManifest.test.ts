import { describe, expect, it } from "vitest";
import { ANCHORS_FORMAT, compareManifests, parseManifest, type AnchorsManifest } from "../../src/build/anchorsManifest.js";

const manifest = (pages: Record<string, string[]>, forwards: Record<string, Record<string, string>> = {}): AnchorsManifest => ({ format: ANCHORS_FORMAT, pages, forwards });

describe("comparing two anchors manifests", () => {
  it("reports anchors that vanished as lost, and marks the ones whose page vanished", () => {
    const before = manifest({ "a.html": ["x", "y"], "b.html": ["z"] });
    const after = manifest({ "a.html": ["new", "y"] });
    expect(compareManifests(before, after)).toEqual({
      moved: [],
      lost: [
        { page: "a.html", anchor: "x", pageGone: false },
        { page: "b.html", anchor: "z", pageGone: true },
      ],
    });
    expect(compareManifests(after, after)).toEqual({ moved: [], lost: [] });
  });

  it("counts an anchor as moved only when a forward sends it to a page that has it", () => {
    const before = manifest({ "a.html": ["kept", "moved", "dangling"] });
    const after = manifest({ "a.html": ["kept"], "a/b.html": ["moved"] }, { "a.html": { moved: "a/b.html", dangling: "a/b.html" } });
    expect(compareManifests(before, after)).toEqual({
      moved: [{ page: "a.html", anchor: "moved", to: "a/b.html#moved" }],
      lost: [{ page: "a.html", anchor: "dangling", pageGone: false }],
    });
  });

  it("reads manifests of format 1 (pages only) as well as format 2", () => {
    const old = parseManifest({ format: "sublevel-atlas/anchors@1", pages: { "a.html": ["x"] } });
    expect(old).toEqual({ format: "sublevel-atlas/anchors@1", pages: { "a.html": ["x"] }, forwards: {} });
  });

  it("refuses a file that is not an anchors manifest", () => {
    expect(parseManifest({ format: "other", pages: {} })).toMatch(/format/);
    expect(parseManifest({ format: ANCHORS_FORMAT, pages: { "a.html": [1] } })).toMatch(/a\.html/);
    expect(parseManifest({ format: ANCHORS_FORMAT, pages: [] })).toMatch(/pages/);
    expect(parseManifest({ format: ANCHORS_FORMAT, pages: {}, forwards: { "a.html": { x: 1 } } })).toMatch(/forwards/);
    expect(parseManifest(null)).toMatch(/object/);
    expect(typeof parseManifest({ format: ANCHORS_FORMAT, pages: { "a.html": ["x"] } })).toBe("object");
  });
});
