/**
 * Headless Debian Chromium driven by playwright-core, and a small static
 * file server on 127.0.0.1, for the browser tests. Chromium comes from the
 * Debian package (installed by .ci/run), never from a download.
 */
import { createServer, type Server } from "node:http";
import { existsSync, readFileSync, statSync } from "node:fs";
import { extname, join, normalize } from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { demoSite, tempDir } from "./runBuild.js";

export const CHROMIUM = process.env.CHROMIUM_PATH || "/usr/bin/chromium";
export const hasChromium = existsSync(CHROMIUM);

const FLAGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export async function launchBrowser(viewport = { width: 1280, height: 900 }): Promise<BrowserContext> {
  return chromium.launchPersistentContext(tempDir("atlas-chromium-"), {
    executablePath: CHROMIUM,
    args: FLAGS,
    viewport,
  });
}

const TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".json": "application/json; charset=utf-8",
  ".csv": "text/csv; charset=utf-8",
  ".svg": "image/svg+xml",
};

export interface StaticServer {
  /** Base URL including the prefix, ending in "/". */
  url: string;
  close(): Promise<void>;
}

/** Serve `root` under `prefix` (e.g. "/lab/atlas/") on 127.0.0.1 with a random port. */
export async function serveStatic(root: string, prefix = "/"): Promise<StaticServer> {
  const server: Server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://127.0.0.1");
    let path = decodeURIComponent(url.pathname);
    if (!path.startsWith(prefix)) {
      res.writeHead(404).end("outside prefix");
      return;
    }
    path = normalize(path.slice(prefix.length));
    if (path.startsWith("..")) {
      res.writeHead(403).end();
      return;
    }
    let file = join(root, path);
    if (existsSync(file) && statSync(file).isDirectory()) file = join(file, "index.html");
    if (!existsSync(file)) {
      res.writeHead(404).end("not found");
      return;
    }
    res.writeHead(200, { "content-type": TYPES[extname(file)] ?? "application/octet-stream" });
    res.end(readFileSync(file));
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const addr = server.address();
  const port = typeof addr === "object" && addr ? addr.port : 0;
  return {
    url: `http://127.0.0.1:${port}${prefix}`,
    close: () => new Promise<void>((r) => server.close(() => r())),
  };
}

/**
 * Console errors, page errors, HTTP errors and every request whose URL does
 * not start with one of `allowed`, collected while the page lives; a test
 * asserts the list is empty.
 */
export function watchPage(page: Page, allowed: string[]): string[] {
  const problems: string[] = [];
  page.on("console", (m) => {
    if (m.type() === "error") problems.push(`console: ${m.text()}`);
  });
  page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
  page.on("response", (r) => {
    if (r.status() >= 400) problems.push(`HTTP ${r.status()}: ${r.url()}`);
  });
  page.on("request", (r) => {
    if (!allowed.some((a) => r.url().startsWith(a))) problems.push(`request: ${r.url()}`);
  });
  return problems;
}

/** The shared demo build, one browser, and the site served under `prefix`: what most browser test files start with. */
export async function openDemo(prefix = "/"): Promise<{ site: string; ctx: BrowserContext; server: StaticServer }> {
  const site = await demoSite();
  const ctx = await launchBrowser();
  const server = await serveStatic(site, prefix);
  return { site, ctx, server };
}

/** Close what openDemo opened (either may be missing when set-up failed). */
export async function closeDemo(ctx: BrowserContext | undefined, server: StaticServer | undefined): Promise<void> {
  await ctx?.close();
  await server?.close();
}
