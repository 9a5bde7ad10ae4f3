/** A real export made by the real code from the catalogue's valid folder (87Rb and 88Sr), parsed; a fresh copy on each call. */
import { rmSync } from "node:fs";
import { buildAtlas } from "../../src/site/atlas.js";
import { loadDataFolder } from "../../src/data/loadDataFolder.js";
import { editionByName } from "../../src/physics/constants/editions.js";
import { validFolder } from "../catalogue/validData.js";
import { writeFolder } from "../catalogue/writeFolder.js";

let texts: Map<string, string> | null = null;

export function realExport(id: "rb87" | "sr88"): Record<string, any> {
  if (!texts) {
    const dir = writeFolder(validFolder());
    try {
      const folder = loadDataFolder(dir);
      const atlas = buildAtlas(folder, editionByName(folder.site.constants)!, "2027-01-01T00:00:00.000Z");
      texts = new Map(atlas.species.map((s) => [s.id, s.exportJson]));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }
  return JSON.parse(texts.get(id)!);
}
