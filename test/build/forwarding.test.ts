import { readFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { compareManifests, parseManifest, type AnchorsManifest } from "../../src/build/anchorsManifest.js";
import { movedMap, movedScript, parseMovedScript } from "../../src/build/forwarding.js";
import { ROOT, demoSite } from "../support/runBuild.js";

const load = (path: string): AnchorsManifest => {
  const m = parseManifest(JSON.parse(readFileSync(path, "utf8")));
  if (typeof m === "string") throw new Error(m);
  return m;
};

describe("the forwarding map of a page", () => {
  it("sends each id of the pages below it that it lacks to the first such page, by path", () => {
    const overview = { path: "species/x/", ids: ["main", "level:a"] };
    const pages = [
      overview,
      { path: "species/x/line/L/", ids: ["main", "line:L:mu=1,ml=0", "shared"] },
      { path: "species/x/level/a/", ids: ["main", "rf:a:1", "shared"] },
      { path: "species/y/", ids: ["elsewhere"] },
    ];
    expect(movedMap(overview, pages)).toEqual({
      pages: ["level/a/index.html", "line/L/index.html"],
      ids: { "line:L:mu=1,ml=0": 1, "rf:a:1": 0, shared: 0 },
    });
    expect(movedMap(pages[3]!, pages)).toBeNull();
  });

  it("sends an id whose form changed to its new form on the page that has it", () => {
    const overview = { path: "species/x/", ids: ["main"] };
    const level = { path: "species/x/level/a/", ids: ["axis-lin:a"] };
    const map = movedMap(overview, [overview, level], [{ id: "axis-lin-1", path: "species/x/level/a/", target: "axis-lin:a" }]);
    expect(map).toEqual({ pages: ["level/a/index.html"], ids: { "axis-lin:a": 0 }, renamed: { "axis-lin-1": [0, "axis-lin:a"] } });
  });

  it("reads back the script it writes", () => {
    const map = { pages: ["line/D2/index.html"], ids: { "line:D2:mu=1/2,ml=-1/2": 0 } };
    expect(parseMovedScript(movedScript(map))).toEqual(map);
  });
});

describe("links saved before the page split", () => {
  let now: AnchorsManifest;
  beforeAll(async () => {
    now = load(join(await demoSite(), "anchors.json"));
  }, 600_000);

  // The manifest a lab kept: the demo built by the one-page-per-species layout (committed fixture).
  const before = load(join(ROOT, "test/fixtures/anchors/manifest-before-page-split.json"));

  it("all still land: each old page#anchor exists, or is forwarded to a page that has it", () => {
    const { moved, lost } = compareManifests(before, now);
    expect(lost).toEqual([]);
    // The field-dependent rows moved to level and line pages.
    expect(moved.length).toBeGreaterThan(1000);
    expect(moved.find((m) => m.anchor === "rf:5s-S1/2:F=1,mF=0:F=2,mF=0" && m.page === "species/rb87/index.html")?.to).toBe(
      "species/rb87/level/5s-S1_2/index.html#rf:5s-S1/2:F=1,mF=0:F=2,mF=0",
    );
  });
});
