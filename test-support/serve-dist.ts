/**
 * Test helpers for the browser tests: a static server for the built pages on localhost (dist/ at /, Office.js
 * from node_modules at /office-js/), and Debian's Chromium launched through playwright-core (DEVELOPERS.md flags).
 * The built pages load Office.js from its CDN by default; requests for it are answered from the local copy.
 */
import { createServer, Server } from "http";
import { existsSync, mkdtempSync, readFileSync, statSync } from "fs";
import { tmpdir } from "os";
import { extname, join, normalize, resolve } from "path";
import { chromium, BrowserContext, Page } from "playwright-core";

export const ROOT = resolve(__dirname, "..");
/** Built pages: $REDOX_DIST, default dist/ (npm test builds it before vitest). */
export const DIST = resolve(ROOT, process.env.REDOX_DIST ?? "dist");
export const OFFICE_JS_DIR = resolve(ROOT, "node_modules/@microsoft/office-js/dist");
export const CHROMIUM = process.env.REDOX_CHROMIUM ?? "/usr/bin/chromium";

const TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".json": "application/json",
  ".png": "image/png",
  ".csv": "text/csv; charset=utf-8",
  ".map": "application/json",
  ".svg": "image/svg+xml",
};

function fileFor(root: string, urlPath: string): string | null {
  const full = normalize(join(root, decodeURIComponent(urlPath)));
  if (!full.startsWith(root)) return null;
  return existsSync(full) && statSync(full).isFile() ? full : null;
}

export async function serveDist(): Promise<{ server: Server; origin: string }> {
  if (!existsSync(join(DIST, "taskpane.html")))
    throw new Error(`${DIST}/taskpane.html is missing: build first (npm run build, or set REDOX_DIST)`);
  const server = createServer((request, response) => {
    const path = new URL(request.url ?? "/", "http://localhost").pathname;
    const file = path.startsWith("/office-js/")
      ? fileFor(OFFICE_JS_DIR, path.slice("/office-js/".length))
      : fileFor(DIST, path === "/" ? "taskpane.html" : path);
    if (!file) {
      response.writeHead(404).end("not found");
      return;
    }
    response.writeHead(200, { "content-type": TYPES[extname(file)] ?? "application/octet-stream" });
    response.end(readFileSync(file));
  });
  await new Promise<void>((done) => server.listen(0, "127.0.0.1", done));
  const address = server.address();
  if (!address || typeof address === "string") throw new Error("server did not bind");
  return { server, origin: `http://localhost:${address.port}` };
}

export async function launchChromium(): Promise<BrowserContext> {
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: apt-get install -y chromium (.ci/run does this)`);
  return chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), "redox-chromium-")), {
    executablePath: CHROMIUM,
    headless: true,
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-background-networking",
      "--disable-component-update",
    ],
    acceptDownloads: true,
    viewport: { width: 1000, height: 1600 },
    deviceScaleFactor: 1,
  });
}

/** Answers requests for Office.js on its CDN from the local copy (offline tests). */
export async function routeOfficeJs(page: Page): Promise<void> {
  await page.route("https://appsforoffice.microsoft.com/**", async (route) => {
    const path = new URL(route.request().url()).pathname.replace(/^\/lib\/1\/hosted\//, "");
    const file = fileFor(OFFICE_JS_DIR, path);
    if (!file) return route.fulfill({ status: 404, body: "" });
    await route.fulfill({
      status: 200,
      contentType: TYPES[extname(file)] ?? "text/javascript",
      body: readFileSync(file),
    });
  });
}

/** A served dist/, a Chromium and a page with the standalone pane open and ready; `close` tears all down. */
export interface OpenPane {
  page: Page;
  /** Reloads the pane page (a fresh pane on the same server and browser). */
  reload(): Promise<void>;
  close(): Promise<void>;
}

export async function openStandalonePane(): Promise<OpenPane> {
  const { server, origin } = await serveDist();
  const context = await launchChromium();
  const page = await context.newPage();
  await routeOfficeJs(page);
  page.on("pageerror", (error) => console.error("page error:", error.message));
  const reload = async () => {
    await page.goto(`${origin}/taskpane.html`);
    await page.waitForSelector('body[data-pane-ready="standalone"]', { timeout: 30_000 });
  };
  await reload();
  return {
    page,
    reload,
    close: async () => {
      await context.close();
      await new Promise((done) => server.close(done));
    },
  };
}
