import { createClient } from "@libsql/client";
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { baseURL, openBrowser, pickExample, pickProfile, signIn } from "./support/browser";
import { recordCspViolations, waitForHydration } from "./support/csp";

type Session = Awaited<ReturnType<typeof openBrowser>>;

const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));
const HOSTILE_NAME = `<script>window.__injected = 1</script><img src=x onerror="window.__injected = 2">Ada "Quote" O'Brink & Co`;

function directives(policy: string): Map<string, string[]> {
  return new Map(
    policy
      .split(";")
      .map((part) => part.trim().split(/\s+/))
      .filter((words) => words[0])
      .map(([name, ...values]) => [name!, values]),
  );
}

/** The production build's session cookie: the __Host- prefix makes the browser insist on Secure, path /, no domain. */
const SESSION_COOKIE = "__Host-towmargin_session";

async function sessionCookie(session: Session): Promise<string | undefined> {
  return (await session.context.cookies()).find((cookie) => cookie.name === SESSION_COOKIE)?.value;
}

async function meWith(cookie: string): Promise<number> {
  return (await fetch(`${baseURL()}/api/v1/me`, { headers: { cookie: `${SESSION_COOKIE}=${cookie}` } })).status;
}

describe("security headers", () => {
  it("pages carry a strict policy with a fresh nonce that the page's own scripts carry", async () => {
    const first = await fetch(`${baseURL()}/sign-in`);
    const second = await fetch(`${baseURL()}/sign-in`);
    const policy = first.headers.get("content-security-policy")!;
    const parsed = directives(policy);
    const nonce = parsed.get("script-src")!.find((value) => value.startsWith("'nonce-"))!.slice(7, -1);
    expect(nonce.length).toBeGreaterThanOrEqual(22);
    expect(second.headers.get("content-security-policy")).not.toContain(nonce);
    expect(parsed.get("script-src")).toEqual(["'self'", `'nonce-${nonce}'`, "'strict-dynamic'"]);
    expect(parsed.get("object-src")).toEqual(["'none'"]);
    expect(parsed.get("base-uri")).toEqual(["'none'"]);
    expect(parsed.get("frame-ancestors")).toEqual(["'none'"]);
    expect(parsed.get("form-action")).toEqual(["'self'"]);
    expect(parsed.get("default-src")).toEqual(["'self'"]);
    expect(policy).not.toContain("unsafe-eval");
    expect(parsed.get("script-src")).not.toContain("'unsafe-inline'");
    const html = await first.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((match) => match[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag, tag).toContain(`nonce="${nonce}"`);
    expect(first.headers.get("x-content-type-options")).toBe("nosniff");
    expect(first.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    expect(first.headers.get("x-frame-options")).toBe("DENY");
    expect(first.headers.get("x-powered-by")).toBeNull();
    expect(first.headers.get("strict-transport-security")).toMatch(/^max-age=\d{8,}; includeSubDomains$/);
  });

  it("custom POST routes refuse a request from another site and a body not declared as JSON", async () => {
    const body = JSON.stringify(camper);
    const post = (headers: Record<string, string>) => fetch(`${baseURL()}/api/v1/evaluate`, { method: "POST", headers, body });
    expect((await post({ "content-type": "application/json", origin: "https://evil.example.com" })).status).toBe(403);
    expect((await post({ "content-type": "text/plain" })).status).toBe(415);
    expect((await post({ "content-type": "application/json", origin: new URL(baseURL()).origin })).status).toBe(200);
  });

  it("JSON answers may run nothing at all", async () => {
    const response = await fetch(`${baseURL()}/api/v1/health`);
    expect(response.headers.get("content-security-policy")).toBe("default-src 'none'; frame-ancestors 'none'");
    expect(response.headers.get("x-content-type-options")).toBe("nosniff");
  });
});

describe("pages hydrate and work under the policy", () => {
  let staff: Session;
  let owner: Session;
  let visitor: Session;
  beforeAll(async () => {
    [staff, owner, visitor] = await Promise.all([openBrowser(), openBrowser(), openBrowser()]);
    await signIn(staff.page, "counter2@quillfield.example.com");
    await signIn(owner.page, "owner@quillfield.example.com");
  });
  afterAll(async () => {
    await Promise.all([staff.close(), owner.close(), visitor.close()]);
  });

  const visit = async (session: Session, path: string) => {
    const page = await session.context.newPage();
    const csp = recordCspViolations(page);
    const response = await page.goto(path);
    await waitForHydration(page);
    return { page, response, csp };
  };

  it("public pages: landing, sign-in, sign-up, quick check (with a live verdict)", async () => {
    for (const path of ["/", "/sign-in", "/sign-up", "/forgot-password"]) {
      const { page, response, csp } = await visit(visitor, path);
      expect(response?.status(), path).toBe(200);
      expect(await csp.violations(), path).toEqual([]);
      await page.close();
    }
    const { page, csp } = await visit(visitor, "/quick-check");
    await pickExample(page, { index: 1 });
    await expect.poll(() => page.getByTestId("verdict-level").first().getAttribute("data-level")).toMatch(/within|tight|adjust|over/);
    expect(await csp.violations()).toEqual([]);
    await page.close();
  });

  it("workspace pages: overview, check (live verdict and charts), saved checks, team, settings, mailbox, fleet, training", async () => {
    for (const [session, path] of [
      [staff, "/overview"],
      [staff, "/checks"],
      [owner, "/team"],
      [owner, "/settings"],
      [owner, "/mailbox"],
      [owner, "/fleet"],
      [owner, "/fleet/vehicles"],
      [owner, "/fleet/matrix"],
      [owner, "/training"],
      [owner, "/training/library"],
    ] as const) {
      const { page, response, csp } = await visit(session, path);
      expect(response?.status(), path).toBe(200);
      expect(await csp.violations(), path).toEqual([]);
      await page.close();
    }
    const { page, csp } = await visit(staff, "/check");
    // A choice made before the page's scripts run is lost: wait until it is live, then for each fill's notice.
    await waitForHydration(page);
    await pickProfile(page, "Saved vehicle", { index: 1 });
    await pickProfile(page, "Saved trailer", { index: 1 });
    await expect.poll(() => page.getByTestId("verdict-level").first().getAttribute("data-level")).toMatch(/within|tight|adjust|over/);
    await page.mouse.wheel(0, 4000);
    await page.locator(".recharts-surface").first().waitFor({ timeout: 15_000 });
    expect(await csp.violations()).toEqual([]);
    await page.close();
  });

  it("a hostile customer name renders as text on the saved check and on the customer's page", async () => {
    const saved = await staff.page.request.post("/api/v1/checks", { data: { rig: camper, customerName: HOSTILE_NAME } });
    expect(saved.status()).toBe(201);
    const { id } = (await saved.json()) as { id: string };

    const detail = await visit(staff, `/checks/${id}`);
    await expect.poll(() => detail.page.locator("main").innerText()).toContain(HOSTILE_NAME);
    expect(await detail.page.evaluate(() => (window as unknown as { __injected?: number }).__injected)).toBeUndefined();
    expect(await detail.page.locator("img[src='x']").count()).toBe(0);
    await detail.page.getByRole("button", { name: "Make a customer link" }).click();
    const linkField = detail.page.getByLabel("Customer link", { exact: true });
    await linkField.waitFor();
    const linkUrl = await linkField.inputValue();
    expect(await detail.csp.violations()).toEqual([]);

    const customer = await visit(visitor, linkUrl);
    expect(customer.response?.status()).toBe(200);
    expect(customer.response?.headers()["referrer-policy"]).toBe("no-referrer");
    await expect.poll(() => customer.page.locator("main").innerText()).toContain(HOSTILE_NAME);
    expect(await customer.page.evaluate(() => (window as unknown as { __injected?: number }).__injected)).toBeUndefined();
    expect(await customer.page.locator("img[src='x']").count()).toBe(0);
    expect(await customer.csp.violations()).toEqual([]);
    await Promise.all([detail.page.close(), customer.page.close()]);
  });
});

describe("sessions", () => {
  it("a planted session cookie is replaced at sign-in and opens nothing", async () => {
    const session = await openBrowser();
    try {
      const planted = "plantedsessionid0000000000000000";
      // Planted from a page of the site itself (a __Host- cookie cannot come from a sibling host or carry a domain).
      await session.page.goto("/sign-in");
      await session.page.evaluate(([name, value]) => (document.cookie = `${name}=${value}; Secure; Path=/`), [SESSION_COOKIE, planted] as const);
      expect(await sessionCookie(session)).toBe(planted);
      await signIn(session.page, "counter2@quillfield.example.com");
      const issued = await sessionCookie(session);
      expect(issued).toBeDefined();
      expect(issued).not.toBe(planted);
      expect(await meWith(planted)).toBe(401);
      expect(await meWith(issued!)).toBe(200);
    } finally {
      await session.close();
    }
  });

  it("signing out ends the session on the server, not only in this browser", async () => {
    const session = await openBrowser();
    try {
      await signIn(session.page, "counter2@quillfield.example.com");
      const cookie = (await sessionCookie(session))!;
      expect(await meWith(cookie)).toBe(200);
      await session.page.getByRole("button", { name: "Sign out" }).click();
      await session.page.waitForURL(/\/sign-in/);
      expect(await sessionCookie(session)).toBeUndefined();
      // The old cookie, replayed from elsewhere, is dead.
      expect(await meWith(cookie)).toBe(401);
    } finally {
      await session.close();
    }
  });

  it("sign-in is limited per account: the ninth attempt in a row is refused, known or unknown address", async () => {
    const session = await openBrowser();
    try {
      const { page } = session;
      // A made-up forwarding header changes nothing: with no trusted proxy the connection's address counts
      // (the browser tests raise the per-address limit, so the per-account limit is what refuses here).
      await session.context.setExtraHTTPHeaders({ "x-forwarded-for": "198.51.100.77" });
      const messages: string[] = [];
      for (let attempt = 1; attempt <= 9; attempt++) {
        await page.goto("/sign-in");
        await page.getByLabel("E-mail").fill("nobody-here@quillfield.example.com");
        await page.getByLabel("Password").fill(`wrong guess ${attempt}`);
        await page.getByRole("button", { name: "Sign in" }).click();
        const alert = page.getByText(/do not match an account|Too many attempts/).first();
        await alert.waitFor();
        messages.push((await alert.innerText()).trim());
      }
      expect(messages.slice(0, 8).every((m) => m.includes("do not match an account"))).toBe(true);
      expect(messages[8]).toMatch(/Too many attempts\. Wait \d+ minutes? and try again\./);
    } finally {
      await session.close();
    }
  });
});

describe("customer links", () => {
  it("tokens carry 192 random bits, and a withdrawn or made-up link opens nothing", async () => {
    const session = await openBrowser();
    try {
      await signIn(session.page, "counter2@quillfield.example.com");
      const saved = await session.page.request.post("/api/v1/checks", { data: { rig: camper, customerName: "Link Entropy" } });
      const { id } = (await saved.json()) as { id: string };
      const tokens: string[] = [];
      await session.page.goto(`/checks/${id}`);
      const field = session.page.getByLabel("Customer link", { exact: true });
      let previous = "";
      for (let i = 0; i < 2; i++) {
        await session.page.getByRole("button", { name: "Make a customer link" }).click();
        await expect.poll(async () => ((await field.count()) ? await field.inputValue() : "")).not.toBe(previous);
        previous = await field.inputValue();
        tokens.push(previous.split("/r/")[1]!);
      }
      for (const token of tokens) expect(token).toMatch(/^[A-Za-z0-9_-]{32}$/); // 32 base64url characters × 6 bits = 192 bits
      expect(tokens[0]).not.toBe(tokens[1]);
      // The database keeps only the hash of a token, never the token.
      const client = createClient({ url: inject("databaseUrl") });
      try {
        const rows = (await client.execute("SELECT token_hash FROM share_links")).rows.map((row) => String(row.token_hash));
        for (const token of tokens) expect(rows).not.toContain(token);
      } finally {
        client.close();
      }
      expect((await fetch(`${baseURL()}/r/${tokens[0]}`)).status).toBe(200);
      await session.page.getByRole("button", { name: /Withdraw the link ending/ }).first().click();
      await session.page.getByRole("cell", { name: "Withdrawn" }).first().waitFor();
      const statuses = await Promise.all(tokens.map(async (token) => (await fetch(`${baseURL()}/r/${token}`)).status));
      expect(statuses.sort()).toEqual([200, 404]);
      expect((await fetch(`${baseURL()}/r/${"A".repeat(32)}`)).status).toBe(404);
    } finally {
      await session.close();
    }
  });
});
