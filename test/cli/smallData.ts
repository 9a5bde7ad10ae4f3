/**
 * A small valid data folder for tests that run many real builds: the
 * catalogue's 88Sr (no nucleus, so no hyperfine field tables) and its site
 * settings. Realistic input, not check values.
 */
import { SITE, SR88 } from "../catalogue/validData.js";
import { writeFolder } from "../catalogue/writeFolder.js";

export function smallDataFolder(parent?: string): string {
  return writeFolder({ "species/sr88.yaml": SR88, "site.yaml": SITE }, parent);
}
