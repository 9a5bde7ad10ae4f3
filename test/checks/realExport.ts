/** A real export made by the real code from the catalogue's valid folder (87Rb and 88Sr), parsed; a fresh copy on each call. */
import { rmSync } from "node:fs";
import { exportsOf } from "../support/exports.js";
import { validFolder } from "../catalogue/validData.js";
import { writeFolder } from "../catalogue/writeFolder.js";

let texts: Map<string, string> | null = null;

export function realExport(id: "rb87" | "sr88"): Record<string, any> {
  if (!texts) {
    const dir = writeFolder(validFolder());
    try {
      texts = exportsOf(dir);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }
  return JSON.parse(texts.get(id)!);
}
