// Shared helpers for browser tests: one Chromium per test file, pages at a phone size by default, console
// errors recorded, screenshots kept in tests/artifacts/ (git-ignored, collected by CI).
import { mkdir } from "node:fs/promises";
import path from "node:path";
import { chromium, type Browser, type BrowserContext, type BrowserContextOptions, type Page } from "playwright-core";
import { afterAll, beforeAll } from "vitest";

export const PHONE = { width: 390, height: 844 } as const;
export const DESKTOP = { width: 1280, height: 800 } as const;

export type ViewportChoice = "phone" | "desktop" | { width: number; height: number };

export const ARTIFACTS_DIR = path.resolve(process.cwd(), "tests/artifacts");

const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

/** The app under test; scripts/test.sh sets it, a developer's running `next start -p 3100` matches the default. */
export function baseUrl(): string {
  return (process.env.E2E_BASE_URL ?? "http://127.0.0.1:3100").replace(/\/$/, "");
}

export function launchChromium(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_ARGS });
}

export type OpenOptions = {
  viewport?: ViewportChoice;
  /** Cookies and local storage to start from, e.g. a signed-in session saved by another page. */
  storageState?: BrowserContextOptions["storageState"];
  /** Messages matching one of these are not counted as console errors (use for expected 401s and the like). */
  allowConsole?: RegExp[];
};

export type OpenedPage = {
  page: Page;
  context: BrowserContext;
  /** Console errors and uncaught page errors seen so far, in order. */
  consoleErrors: string[];
  /** Goes to a path of the app (or a full URL) and waits for the page's load event and its fonts. */
  goto: (pathOrUrl: string) => Promise<void>;
  /** Saves a PNG to tests/artifacts/<name>.png (the whole page unless fullPage is false) and returns its path. */
  screenshot: (name: string, options?: ScreenshotOptions) => Promise<string>;
  close: () => Promise<void>;
};

function viewportSize(choice: ViewportChoice): { width: number; height: number } {
  if (choice === "phone") return PHONE;
  if (choice === "desktop") return DESKTOP;
  return choice;
}

export type ScreenshotOptions = {
  /** The whole scrolled page (default) or only what the screen shows; bars fixed to the screen sit mid-page in a full shot. */
  fullPage?: boolean;
};

export async function saveScreenshot(page: Page, name: string, options: ScreenshotOptions = {}): Promise<string> {
  await mkdir(ARTIFACTS_DIR, { recursive: true });
  const file = path.join(ARTIFACTS_DIR, `${name.replace(/[^a-z0-9._-]+/gi, "-")}.png`);
  await page.screenshot({ path: file, fullPage: options.fullPage ?? true });
  return file;
}

/** Opens a fresh context (no cookies, empty storage) and a page in it, at `path` when given. */
export async function openPage(browser: Browser, pathOrUrl: string | null, options: OpenOptions = {}): Promise<OpenedPage> {
  const choice = options.viewport ?? "phone";
  const phone = choice === "phone";
  const context = await browser.newContext({
    baseURL: baseUrl(),
    viewport: viewportSize(choice),
    deviceScaleFactor: phone ? 2 : 1,
    isMobile: phone,
    hasTouch: phone,
    locale: "en-US",
    timezoneId: "America/Chicago",
    storageState: options.storageState,
  });
  const page = await context.newPage();
  const consoleErrors: string[] = [];
  const allowed = options.allowConsole ?? [];
  page.on("console", (message) => {
    if (message.type() !== "error") return;
    const text = message.text();
    if (allowed.some((pattern) => pattern.test(text))) return;
    const where = message.location().url;
    consoleErrors.push(where ? `${text} (${where})` : text);
  });
  page.on("pageerror", (error) => {
    consoleErrors.push(`uncaught: ${error.message}`);
  });

  const goto = async (target: string) => {
    const url = /^https?:\/\//.test(target) ? target : `${baseUrl()}${target.startsWith("/") ? "" : "/"}${target}`;
    // Not "networkidle": the App Router prefetches links and streams, so the network may never go quiet.
    // Tests wait for what they need to see (a heading, a result) with locators instead.
    await page.goto(url, { waitUntil: "load" });
    await page.evaluate(async () => {
      await document.fonts.ready;
    });
  };

  if (pathOrUrl !== null) await goto(pathOrUrl);

  return {
    page,
    context,
    consoleErrors,
    goto,
    screenshot: (name, screenshotOptions) => saveScreenshot(page, name, screenshotOptions),
    close: () => context.close(),
  };
}

export type BrowserSession = {
  /** The file's Chromium; valid inside tests (after beforeAll). */
  browser: () => Browser;
  open: (pathOrUrl: string | null, options?: OpenOptions) => Promise<OpenedPage>;
};

/**
 * Call once at the top of a test file: launches Chromium before the file's tests and closes it (and every
 * page opened through `open`) after them.
 */
export function setupBrowser(): BrowserSession {
  let current: Browser | null = null;
  const opened: OpenedPage[] = [];

  beforeAll(async () => {
    current = await launchChromium();
  });

  afterAll(async () => {
    await Promise.allSettled(opened.map((entry) => entry.close()));
    await current?.close();
    current = null;
  });

  const browser = () => {
    if (!current) throw new Error("Chromium is not running: call open() inside a test, after setupBrowser()'s beforeAll");
    return current;
  };

  return {
    browser,
    open: async (pathOrUrl, options) => {
      const entry = await openPage(browser(), pathOrUrl, options);
      opened.push(entry);
      return entry;
    },
  };
}
