import { afterEach, describe, expect, it } from "vitest";
import nextConfig from "@/next.config";
import { demoServerArgs } from "@/lib/dev/demo-server";
import { sessionCookieSettings } from "@/lib/server/session-cookie";

const originalEnv = process.env.NODE_ENV;
afterEach(() => {
  (process.env as Record<string, string | undefined>).NODE_ENV = originalEnv;
});

async function headersFor(path: string) {
  const rules = (await nextConfig.headers!()) ?? [];
  return rules.filter((rule) => rule.source === "/:path*" || rule.source === path).flatMap((rule) => rule.headers);
}

describe("transport and cookie settings", () => {
  it("sends HSTS in production only", async () => {
    (process.env as Record<string, string>).NODE_ENV = "production";
    const production = await headersFor("/:path*");
    expect(production.find((h) => h.key === "Strict-Transport-Security")?.value).toMatch(/^max-age=\d{8,}; includeSubDomains$/);
    (process.env as Record<string, string>).NODE_ENV = "development";
    expect((await headersFor("/:path*")).find((h) => h.key === "Strict-Transport-Security")).toBeUndefined();
  });

  it("names the session cookie with the __Host- prefix in production: Secure, path /, no domain", () => {
    const production = sessionCookieSettings(true);
    expect(production.name).toBe("__Host-towmargin_session");
    expect(production.attributes).toEqual({ secure: true, sameSite: "lax", path: "/" });
    const development = sessionCookieSettings(false);
    expect(development.name).toBe("towmargin_session");
    expect(development.attributes.secure).toBe(false);
  });

  it("the demo server listens on the loopback address only", () => {
    const args = demoServerArgs("3000");
    expect(args.slice(0, 2)).toEqual(["next", "start"]);
    expect(args[args.indexOf("-H") + 1]).toBe("127.0.0.1");
    expect(args[args.indexOf("-p") + 1]).toBe("3000");
  });
});
