/**
 * The constants editions this build knows. A build chooses one, once, from
 * site.yaml (`constants:`), defaulting to the newest.
 */
import type { ConstantsEdition } from "./constant.js";
import { CODATA_2022 } from "./codata2022.js";

export const EDITIONS: Readonly<Record<string, ConstantsEdition>> = Object.freeze({
  "CODATA 2022": CODATA_2022,
});

export const DEFAULT_EDITION = "CODATA 2022";

export function editionByName(name: string): ConstantsEdition | undefined {
  return EDITIONS[name];
}
