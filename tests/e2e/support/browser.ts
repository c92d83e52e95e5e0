import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

// Debian's Chromium driven by playwright-core. launchPersistentContext because
// launch() refuses --user-data-dir; the flags keep it off the (closed) network.
const flags = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-dev-shm-usage",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  /** Console errors and CSP violations seen so far. */
  problems: string[];
  close: () => Promise<void>;
}

export async function openBrowser(
  options: { width?: number; height?: number } = {},
): Promise<BrowserSession> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "castline-chromium-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: flags,
    viewport: { width: options.width ?? 390, height: options.height ?? 844 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const problems: string[] = [];
  page.on("console", (msg) => {
    if (msg.type() === "error") problems.push(`${msg.text()} at ${msg.location().url}`);
  });
  page.on("pageerror", (err) => problems.push(err.message));
  return {
    context,
    page,
    problems,
    close: async () => {
      await context.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
