import type { Page } from "playwright-core";

/**
 * Records what the Content-Security-Policy blocked on a page: `securitypolicyviolation` events (collected by
 * a script the browser runs before the page's own) and the console's CSP messages.
 */
export function recordCspViolations(page: Page): { violations: () => Promise<string[]> } {
  const consoleMessages: string[] = [];
  page.on("console", (message) => {
    if (/Content Security Policy|Content-Security-Policy/i.test(message.text())) consoleMessages.push(message.text());
  });
  void page.addInitScript(() => {
    const store: string[] = [];
    (window as unknown as { __cspViolations: string[] }).__cspViolations = store;
    document.addEventListener("securitypolicyviolation", (event) => {
      store.push(`${event.violatedDirective} blocked ${event.blockedURI || "inline"} (${event.sourceFile}:${event.lineNumber})`);
    });
  });
  return {
    violations: async () => {
      const fromEvents = await page.evaluate(() => (window as unknown as { __cspViolations?: string[] }).__cspViolations ?? []).catch(() => []);
      return [...fromEvents, ...consoleMessages];
    },
  };
}

/** True once the App Router's client runtime has started: its scripts ran, so the policy let them. */
export async function waitForHydration(page: Page, timeoutMs = 15_000): Promise<void> {
  await page.waitForFunction(() => typeof (window as unknown as { next?: { version?: string } }).next?.version === "string", undefined, { timeout: timeoutMs });
}
