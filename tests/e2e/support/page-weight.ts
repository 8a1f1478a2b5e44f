import type { BrowserContext, Page } from "playwright-core";
import { baseURL, openBrowser } from "./browser";

export interface LoadedScript {
  url: string;
  /** Bytes on the wire (the compressed body), from the browser's resource timing. */
  transferred: number;
  /** Bytes after decompression. */
  decoded: number;
  text: string;
}

export interface ScriptWeight {
  scripts: LoadedScript[];
  transferred: number;
  decoded: number;
}

/**
 * Every script file a first visit loads until the network is quiet, with an empty cache (a fresh browser
 * profile unless a context is given), measured by the browser itself (PerformanceResourceTiming).
 */
export async function firstLoadScripts(path: string, viewport?: { width: number; height: number }, context?: BrowserContext): Promise<ScriptWeight> {
  const own = context ? null : await openBrowser(viewport);
  const page = context ? await context.newPage() : own!.page;
  try {
    const bodies = new Map<string, string>();
    page.on("response", async (response) => {
      if (response.request().resourceType() === "script") bodies.set(response.url(), await response.text().catch(() => ""));
    });
    await page.goto(path, { waitUntil: "load" });
    await page.waitForLoadState("networkidle");
    const entries = await page.evaluate(() =>
      performance
        .getEntriesByType("resource")
        .map((entry) => entry as PerformanceResourceTiming)
        .filter((entry) => entry.initiatorType === "script" || /\.js(\?|$)/.test(entry.name))
        .map((entry) => ({ url: entry.name, transferred: entry.encodedBodySize, decoded: entry.decodedBodySize })),
    );
    const scripts = entries.map((entry) => ({ ...entry, text: bodies.get(entry.url) ?? "" }));
    return {
      scripts,
      transferred: scripts.reduce((sum, s) => sum + s.transferred, 0),
      decoded: scripts.reduce((sum, s) => sum + s.decoded, 0),
    };
  } finally {
    if (own) await own.close();
    else await page.close();
  }
}

/** The script files the server's HTML itself names (script tags and script preloads): the first-load set. */
export async function scriptSourcesInHtml(page: Page, path: string): Promise<Set<string>> {
  const response = await page.request.get(`${baseURL()}${path}`);
  const html = await response.text();
  const sources = new Set<string>();
  for (const match of html.matchAll(/<script[^>]*\ssrc="([^"]+)"/g)) sources.add(new URL(match[1]!, baseURL()).pathname);
  for (const match of html.matchAll(/<link[^>]*rel="(?:preload|modulepreload)"[^>]*as="script"[^>]*href="([^"]+)"|<link[^>]*href="([^"]+)"[^>]*as="script"/g)) {
    sources.add(new URL((match[1] ?? match[2])!, baseURL()).pathname);
  }
  return sources;
}
