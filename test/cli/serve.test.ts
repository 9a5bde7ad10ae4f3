/**
 * `npm run serve` as a user runs it: a child process on a free loopback
 * port, serving a temporary output folder built from a temporary data
 * folder. A saved edit is rebuilt and the version pages poll changes; a
 * broken edit is reported (file:line:column, as the terminal shows it) and
 * the last good pages keep being served; only the output folder is served.
 * Every wait is bounded.
 */
import { readFileSync, rmSync, writeFileSync } from "node:fs";
import { request } from "node:http";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SR88 } from "../catalogue/validData.js";
import { tempDir } from "../support/runBuild.js";
import { startServe, waitForState, type Served } from "./serveProcess.js";

/** A raw GET, so the path reaches the server as written (fetch would normalize "..").  */
function rawGet(url: string, path: string, method = "GET"): Promise<{ status: number; body: string }> {
  const u = new URL(url);
  return new Promise((resolve, reject) => {
    const req = request({ host: u.hostname, port: u.port, path, method }, (res) => {
      let body = "";
      res.on("data", (d) => (body += d));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, body }));
    });
    req.on("error", reject);
    req.end();
  });
}

const parent = tempDir("atlas-serve-");
let served: Served;
beforeAll(async () => {
  served = await startServe(parent);
}, 120_000);
afterAll(async () => {
  await served?.stop();
  rmSync(parent, { recursive: true, force: true });
});

describe("npm run serve", () => {
  it("serves the built site on loopback with the reload script added, rebuilds on save, and keeps the old pages on a broken save", async () => {
    const { url, data, out } = served;
    expect(new URL(url).hostname).toBe("127.0.0.1");
    const first = await waitForState(url, (s) => s.version >= 1 && !s.building);
    expect(first.error).toBeNull();

    // The page as served carries the reload script at the served version; the file on disk does not.
    const page = await fetch(new URL("species/sr88/index.html", url));
    expect(page.status).toBe(200);
    expect(page.headers.get("content-type")).toMatch(/^text\/html/);
    const html = await page.text();
    expect(html).toContain(`<script src="/__atlas_reload.js?v=${first.version}" defer></script></head>`);
    expect(readFileSync(join(out, "species/sr88/index.html"), "utf8")).not.toContain("__atlas_reload");
    const script = await fetch(new URL("__atlas_reload.js", url));
    expect(script.headers.get("content-type")).toMatch(/^text\/javascript/);
    expect(await script.text()).toContain("/__atlas_version");
    expect((await fetch(url)).status).toBe(200);

    // A good save: rebuilt, new version, new text.
    const file = join(data, "species", "sr88.yaml");
    writeFileSync(file, SR88.replace('label: "88Sr"', 'label: "88Sr (edited)"'));
    const second = await waitForState(url, (s) => s.version > first.version && !s.building);
    expect(second.error).toBeNull();
    const edited = await (await fetch(new URL("species/sr88/index.html", url))).text();
    expect(edited).toContain("88Sr (edited)");

    // A broken save: the error as the terminal prints it, the same version, the last good page.
    writeFileSync(file, SR88.replace('label: "88Sr"', 'label: "88Sr (edited)"').replace("term: 3Po1", "term: 3Qo1"));
    const broken = await waitForState(url, (s) => s.error !== null && !s.building);
    expect(broken.version).toBe(second.version);
    expect(broken.error).toMatch(/sr88\.yaml:\d+:\d+: /);
    expect(broken.error).toContain("nothing was published");
    expect(served.output()).toContain(broken.error!.split("\n")[0]!);
    const kept = await fetch(new URL("species/sr88/index.html", url));
    expect(kept.status).toBe(200);
    expect(await kept.text()).toContain("88Sr (edited)");

    // Fixed again: the error clears and pages move on.
    writeFileSync(file, SR88);
    await waitForState(url, (s) => s.error === null && s.version > second.version && !s.building);
    expect(await (await fetch(new URL("species/sr88/index.html", url))).text()).not.toContain("88Sr (edited)");
  }, 300_000);

  it("serves nothing outside the output folder and only reads", async () => {
    const { url } = served;
    for (const path of ["/../../etc/passwd", "/%2e%2e/%2e%2e/etc/passwd", "/..%2f..%2fetc%2fpasswd", "/species/%00"]) {
      const r = await rawGet(url, path);
      expect(r.status, path).toBe(404);
      expect(r.body).not.toContain("root:");
    }
    expect((await rawGet(url, "/", "POST")).status).toBe(405);
    expect((await rawGet(url, "/no-such-page/")).status).toBe(404);
  });

  it("stops on SIGTERM with exit code 0", async () => {
    expect(await served.stop()).toBe(0);
  }, 60_000);
});

describe("npm run serve with data that does not build from the start", () => {
  it("answers every page with the build's message until a save builds, then serves the site", async () => {
    const first = tempDir("atlas-serve-broken-");
    const broken = await startServe(first, (data) => writeFileSync(join(data, "species", "sr88.yaml"), SR88.replace("term: 3Po1", "term: 3Qo1")));
    try {
      const failed = await waitForState(broken.url, (s) => s.error !== null && !s.building);
      expect(failed.version).toBe(0);
      const page = await fetch(new URL("species/sr88/index.html", broken.url));
      expect(page.status).toBe(503);
      const html = await page.text();
      expect(html).toContain("No build yet");
      expect(html).toMatch(/sr88\.yaml:\d+:\d+: /);
      expect(html).toContain('<script src="/__atlas_reload.js?v=0" defer></script>');

      writeFileSync(join(broken.data, "species", "sr88.yaml"), SR88);
      await waitForState(broken.url, (s) => s.version === 1 && s.error === null && !s.building);
      expect((await fetch(new URL("species/sr88/index.html", broken.url))).status).toBe(200);
    } finally {
      expect(await broken.stop()).toBe(0);
      rmSync(first, { recursive: true, force: true });
    }
  }, 300_000);
});
