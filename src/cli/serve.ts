/**
 * `npm run serve [-- --port N]`: a local preview of the site for whoever
 * edits the data. It serves the output folder (ATLAS_OUT, default _site)
 * on 127.0.0.1 only (port 8080 by default; 0 picks a free one), builds once
 * at start, and builds again whenever a file of the data folder (ATLAS_DATA,
 * default data) is saved: fs.watch on the folder, debounced, one build at a
 * time (a save during a build starts another when it ends).
 *
 * Each build is the real build command in a child process, so it is as
 * atomic as `npm run build` and reuses its cache (a one-species edit
 * recomputes that species only). After a build publishes, open pages
 * reload: the preview adds one classic script to every HTML page it serves
 * (never to the files on disk), which polls /__atlas_version. When a build
 * fails, its message — the text the terminal shows — appears at the foot of
 * the open page, and the last good pages keep being served.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, readFileSync, statSync, watch, type FSWatcher } from "node:fs";
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import { createRequire } from "node:module";
import { extname, join, resolve, sep } from "node:path";
import { pathToFileURL } from "node:url";
import { ROOT } from "../build/paths.js";

const HOST = "127.0.0.1";
const DEBOUNCE_MS = 200;
export const VERSION_PATH = "/__atlas_version";
export const RELOAD_PATH = "/__atlas_reload.js";

const TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".json": "application/json; charset=utf-8",
  ".csv": "text/csv; charset=utf-8",
  ".svg": "image/svg+xml",
  ".txt": "text/plain; charset=utf-8",
  ".png": "image/png",
};

/**
 * The script added to served pages. Classic, same-origin (the pages' CSP
 * allows 'self' scripts and fetches, not inline ones); it knows the version
 * its page was served at from its own address.
 */
const RELOAD_SCRIPT = `(function () {
  "use strict";
  var me = document.currentScript;
  var served = me ? new URL(me.src).searchParams.get("v") : null;
  var box = null;
  function show(text) {
    if (!box) {
      box = document.createElement("div");
      box.id = "atlas-preview-error";
      box.setAttribute("role", "alert");
      var s = box.style;
      s.position = "fixed"; s.left = "0"; s.right = "0"; s.bottom = "0"; s.maxHeight = "60vh"; s.overflow = "auto";
      s.zIndex = "2147483647"; s.background = "#fff3f3"; s.color = "#5c0000"; s.borderTop = "3px solid #b00020"; s.padding = "0.5em 1em";
      var p = document.createElement("p");
      p.textContent = "The last save did not build. This page is the last good build; fix the data and save again.";
      var pre = document.createElement("pre");
      pre.style.whiteSpace = "pre-wrap"; pre.style.margin = "0";
      box.appendChild(p);
      box.appendChild(pre);
      document.body.appendChild(box);
    }
    box.lastChild.textContent = text;
  }
  function hide() {
    if (box) { box.remove(); box = null; }
  }
  function poll() {
    fetch("${VERSION_PATH}", { cache: "no-store" }).then(function (r) { return r.json(); }).then(function (s) {
      if (served !== null && String(s.version) !== served) { location.reload(); return; }
      if (s.error) show(s.error); else hide();
      setTimeout(poll, 500);
    }, function () { setTimeout(poll, 2000); });
  }
  poll();
})();
`;

export interface PreviewState {
  /** Counts published builds; a page served at another version reloads. */
  version: number;
  building: boolean;
  /** What the last build printed when it failed; null after a good build. */
  error: string | null;
}

const escapeHtml = (s: string): string => s.replace(/[&<>"]/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" })[c]!);

/** An HTML page as served: the reload script added before </head>. */
export function withReload(html: string, version: number): string {
  const tag = `<script src="${RELOAD_PATH}?v=${version}" defer></script>`;
  const at = html.indexOf("</head>");
  return at < 0 ? html + tag : html.slice(0, at) + tag + html.slice(at);
}

/** The file below `root` a URL path names (index.html for a folder); null outside it or absent. */
export function fileFor(root: string, urlPath: string): string | null {
  let path: string;
  try {
    path = decodeURIComponent(urlPath);
  } catch {
    return null;
  }
  if (path.includes("\0")) return null;
  const base = resolve(root);
  let file = resolve(base, `.${path.startsWith("/") ? path : `/${path}`}`);
  if (file !== base && !file.startsWith(base + sep)) return null;
  try {
    if (statSync(file).isDirectory()) file = join(file, "index.html");
    return statSync(file).isFile() ? file : null;
  } catch {
    return null;
  }
}

export interface PreviewOptions {
  dataDir: string;
  out: string;
  port: number;
  log?: (line: string) => void;
}

export interface Preview {
  url: string;
  state: PreviewState;
  close(): Promise<void>;
}

export async function startPreview(opts: PreviewOptions): Promise<Preview> {
  const log = opts.log ?? ((line: string) => process.stderr.write(`${line}\n`));
  const state: PreviewState = { version: 0, building: false, error: null };
  const tsx = pathToFileURL(createRequire(import.meta.url).resolve("tsx")).href;
  let child: ChildProcess | null = null;
  let again = false;
  let timer: NodeJS.Timeout | null = null;
  let closing = false;

  const build = (): void => {
    if (closing) return;
    if (state.building) {
      again = true;
      return;
    }
    state.building = true;
    again = false;
    const started = Date.now();
    let output = "";
    const c = spawn(process.execPath, ["--import", tsx, join(ROOT, "src/cli/build.ts")], {
      env: { ...process.env, ATLAS_DATA: opts.dataDir, ATLAS_OUT: opts.out },
      stdio: ["ignore", "pipe", "pipe"],
    });
    child = c;
    c.stdout!.on("data", (d) => (output += d));
    c.stderr!.on("data", (d) => (output += d));
    c.on("close", (code, signal) => {
      child = null;
      state.building = false;
      if (closing) return;
      const text = output.replace(/^\[11ty\].*\n/gm, "").trimEnd();
      if (code === 0) {
        state.version++;
        state.error = null;
        log(`${text} (${((Date.now() - started) / 1000).toFixed(1)} s); pages reload`);
      } else {
        state.error = text || `build stopped (${signal ?? `exit code ${code}`})`;
        log(`${state.error}\nthe preview keeps serving the last good build`);
      }
      if (again) schedule();
    });
  };
  const schedule = (): void => {
    if (timer) clearTimeout(timer);
    timer = setTimeout(() => {
      timer = null;
      build();
    }, DEBOUNCE_MS);
  };

  const server = createServer((req: IncomingMessage, res: ServerResponse) => {
    const headers = { "cache-control": "no-store" };
    if (req.method !== "GET" && req.method !== "HEAD") {
      res.writeHead(405, { ...headers, allow: "GET, HEAD" }).end();
      return;
    }
    const path = new URL(req.url ?? "/", `http://${HOST}`).pathname;
    if (path === VERSION_PATH) {
      res.writeHead(200, { ...headers, "content-type": TYPES[".json"] }).end(JSON.stringify(state));
      return;
    }
    if (path === RELOAD_PATH) {
      res.writeHead(200, { ...headers, "content-type": TYPES[".js"] }).end(RELOAD_SCRIPT);
      return;
    }
    const file = fileFor(opts.out, path);
    if (!file) {
      const none = !existsSync(opts.out);
      const body = none
        ? `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>No build yet</title></head><body><h1>No build yet</h1><pre>${escapeHtml(state.error ?? "building…")}</pre></body></html>`
        : `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Not found</title></head><body><h1>Not found</h1><p>${escapeHtml(path)}</p></body></html>`;
      res.writeHead(none ? 503 : 404, { ...headers, "content-type": TYPES[".html"] }).end(withReload(body, state.version));
      return;
    }
    let bytes: Buffer;
    try {
      bytes = readFileSync(file);
    } catch {
      // Swapped out by a publish between the look-up and the read: the reader retries.
      res.writeHead(503, headers).end();
      return;
    }
    const type = TYPES[extname(file)] ?? "application/octet-stream";
    res.writeHead(200, { ...headers, "content-type": type });
    res.end(type === TYPES[".html"] ? withReload(bytes.toString("utf8"), state.version) : bytes);
  });

  let watcher: FSWatcher;
  try {
    watcher = watch(opts.dataDir, { recursive: true }, () => schedule());
  } catch (e) {
    throw new Error(`cannot watch the data folder ${opts.dataDir}: ${e instanceof Error ? e.message : String(e)}`);
  }
  watcher.on("error", (e) => log(`watching ${opts.dataDir} failed: ${e.message}`));

  await new Promise<void>((ok, fail) => {
    server.once("error", fail);
    server.listen(opts.port, HOST, () => ok());
  });
  const addr = server.address();
  const url = `http://${HOST}:${typeof addr === "object" && addr ? addr.port : opts.port}/`;
  build();

  return {
    url,
    state,
    close: async () => {
      closing = true;
      if (timer) clearTimeout(timer);
      watcher.close();
      const c = child;
      if (c) {
        // The build cleans up its staging folder on SIGTERM.
        const done = new Promise((r) => c.once("close", r));
        c.kill("SIGTERM");
        await Promise.race([done, new Promise((r) => setTimeout(r, 10_000))]);
      }
      server.closeAllConnections();
      await new Promise<void>((r) => server.close(() => r()));
    },
  };
}

function portFromArgs(argv: string[]): number {
  const i = argv.indexOf("--port");
  const text = i >= 0 ? argv[i + 1] : argv.find((a) => a.startsWith("--port="))?.slice("--port=".length);
  if (text === undefined) return 8080;
  if (!/^\d+$/.test(text) || Number(text) > 65535) throw new Error(`--port needs a port number from 0 to 65535, not ${text}`);
  return Number(text);
}

async function main(): Promise<void> {
  const dataDir = resolve(process.env.ATLAS_DATA || "data");
  const out = resolve(process.env.ATLAS_OUT || "_site");
  const preview = await startPreview({ dataDir, out, port: portFromArgs(process.argv.slice(2)) });
  process.stdout.write(`serving ${out} at ${preview.url} (rebuilt when ${dataDir} changes; Ctrl-C stops)\n`);
  for (const sig of ["SIGINT", "SIGTERM"] as const) {
    process.once(sig, () => {
      void preview.close().then(() => process.exit(0));
    });
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  main().catch((e: unknown) => {
    process.stderr.write(`serve: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exit(1);
  });
}
