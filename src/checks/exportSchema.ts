/**
 * Every JSON export must validate against schema/export.schema.json (JSON
 * Schema draft 2020-12), the contract lab scripts read.
 */
import { readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import Ajv2020 from "ajv/dist/2020.js";
import type { ValidateFunction } from "ajv";

export const EXPORT_SCHEMA_PATH = join(dirname(fileURLToPath(import.meta.url)), "../../schema/export.schema.json");

let compiled: ValidateFunction | null = null;

function validator(): ValidateFunction {
  if (!compiled) {
    const ajv = new Ajv2020.default({ allErrors: true, strict: true, strictRequired: false });
    compiled = ajv.compile(JSON.parse(readFileSync(EXPORT_SCHEMA_PATH, "utf8")));
  }
  return compiled;
}

/** Problems of one parsed export (`file` names it in the messages); at most 10 are listed. */
export function checkExportSchema(value: unknown, file: string): string[] {
  const validate = validator();
  if (validate(value)) return [];
  const errors = validate.errors ?? [];
  const shown = errors.slice(0, 10).map((e) => `${file}: schema: ${e.instancePath || "/"} ${e.message ?? "is invalid"}`);
  if (errors.length > shown.length) shown.push(`${file}: schema: … and ${errors.length - shown.length} more`);
  return shown;
}
