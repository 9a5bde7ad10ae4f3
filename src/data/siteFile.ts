/**
 * site.yaml → SiteInput. The file and every key in it are optional; the
 * defaults below are what a lab gets without one.
 */
import { isMap, isScalar, type Node } from "yaml";
import { DEFAULT_EDITION, EDITIONS } from "../physics/constants/editions.js";
import type { FieldInput, SiteInput } from "./model.js";
import { parseQuantity } from "./numberText.js";
import { describe, MapReader, scalarText, type YamlSource } from "./yamlExact.js";

export const SITE_KEYS = ["title", "lab", "fields", "constants", "siteUrl", "pathPrefix"] as const;

export const DEFAULT_TITLE = "Sublevel Atlas";
/**
 * Default bias fields: zero, then decades from 1 G to 1000 G (written 0.1 T),
 * spanning the weak-field (Zeeman) regime of typical alkali hyperfine levels
 * through the onset of the Paschen–Back regime of their excited states.
 */
export const DEFAULT_FIELDS = ["0 G", "1 G", "10 G", "100 G", "0.1 T"] as const;
export const DEFAULT_PATH_PREFIX = "/";

function field(text: string): FieldInput {
  const q = parseQuantity(text, "field", "field");
  if (!q.ok) throw new Error(`default field ${text} does not parse`);
  return { text, tesla: q.value.si };
}

/** The site settings used when there is no site.yaml. */
export function defaultSite(): SiteInput {
  return {
    title: DEFAULT_TITLE,
    lab: null,
    fields: sortFields(DEFAULT_FIELDS.map(field)),
    constants: DEFAULT_EDITION,
    siteUrl: null,
    pathPrefix: DEFAULT_PATH_PREFIX,
  };
}

/** Ascending by value; fields equal in value merge into the first written ("1000 G" and "0.1 T"). */
export function sortFields(fields: readonly FieldInput[]): FieldInput[] {
  const out: FieldInput[] = [];
  for (const f of fields) if (!out.some((g) => g.tesla.eq(f.tesla))) out.push(f);
  return out.sort((a, b) => a.tesla.comparedTo(b.tesla));
}

/** Validate a parsed site.yaml; null when it has problems (they are in the sink). */
export function readSiteFile(src: YamlSource): SiteInput | null {
  const site = defaultSite();
  const root = src.root;
  if (root === null || root === undefined) return site; // an empty site.yaml means "all defaults"
  if (!isMap(root)) {
    src.sink.add(src.place(root), `site.yaml must be a map (key: value lines), not ${describe(root)}`, `known keys: ${SITE_KEYS.join(", ")}`);
    return null;
  }
  const before = src.sink.count;
  const r = new MapReader(src, root, "site.yaml", SITE_KEYS);
  const title = r.nonEmpty("title", false);
  if (title) site.title = title.text;
  const lab = r.nonEmpty("lab", false);
  if (lab) site.lab = lab.text;

  const constants = r.text("constants", false);
  if (constants) {
    if (Object.hasOwn(EDITIONS, constants.text)) site.constants = constants.text;
    else src.sink.add(constants.at, `unknown constants edition "${constants.text}"`, `known editions: ${Object.keys(EDITIONS).join(", ")}`);
  }

  const url = r.text("siteUrl", false);
  if (url) {
    let parsed: URL | null = null;
    try {
      parsed = new URL(url.text);
    } catch {
      parsed = null;
    }
    if (!parsed || (parsed.protocol !== "https:" && parsed.protocol !== "http:"))
      src.sink.add(url.at, `siteUrl "${url.text}" is not a web address`, "write the full address starting with https://, or leave siteUrl out");
    else site.siteUrl = url.text;
  }

  const prefix = r.text("pathPrefix", false);
  if (prefix) {
    const p = prefix.text;
    if (!p.startsWith("/") || !p.endsWith("/")) {
      const fixed = `/${p.replace(/^\/+|\/+$/g, "")}/`.replace(/^\/\/$/, "/");
      src.sink.add(prefix.at, `pathPrefix "${p}" must start and end with "/"`, `write "${fixed}"`);
    } else if (!/^\/([A-Za-z0-9._~-]+\/)*$/.test(p) || p.split("/").some((s) => s === "." || s === "..")) {
      src.sink.add(prefix.at, `pathPrefix "${p}" has characters or segments that are not allowed`, 'use letters, digits, ".", "_", "~" and "-" between slashes, e.g. "/atlas/"');
    } else site.pathPrefix = p;
  }

  const fields = r.seq("fields", false, 'fields is a list of bias fields, e.g. fields: ["0 G", "1 G", "10 G"]');
  if (fields) {
    if (fields.items.length === 0) src.sink.add(src.place(fields), "fields is empty", `list at least one field, or leave fields out for the default ${DEFAULT_FIELDS.join(", ")}`);
    const read: FieldInput[] = [];
    for (const item of fields.items as (Node | null)[]) {
      const at = src.place(item ?? fields);
      if (!isScalar(item) || scalarText(item) === null) {
        src.sink.add(at, `each field must be one value such as "10 G", not ${describe(item)}`, 'write fields as a list of texts, e.g. ["0 G", "10 G"]');
        continue;
      }
      const text = scalarText(item) ?? "";
      const q = parseQuantity(text, "field", "field");
      if (!q.ok) {
        src.sink.add(at, `field: ${q.message}`, q.hint);
        continue;
      }
      if (q.value.uncertainty) {
        src.sink.add(at, `field "${text}" has an uncertainty`, "a tabulated field is a setting, not a measurement; write it without one, e.g. 10 G");
        continue;
      }
      if (q.value.si.isNegative() && !q.value.si.isZero()) {
        src.sink.add(at, `field "${text}" is negative`, "tabulated fields are magnitudes, 0 or more; the sign of m covers the direction");
        continue;
      }
      read.push({ text, tesla: q.value.si });
    }
    site.fields = sortFields(read);
  }
  return src.sink.count > before ? null : site;
}

