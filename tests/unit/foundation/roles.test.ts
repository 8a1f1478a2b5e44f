import { describe, expect, it } from "vitest";
import { navigationFor } from "@/lib/navigation";
import { can, PERMISSIONS, ROLES } from "@/lib/roles";

describe("roles", () => {
  it("only owners manage the team and the organisation", () => {
    expect(ROLES.filter((role) => can(role, "team.manage"))).toEqual(["owner"]);
    expect(ROLES.filter((role) => can(role, "organisation.manage"))).toEqual(["owner"]);
  });

  it("owners can do everything any role can", () => {
    for (const permission of Object.keys(PERMISSIONS) as Array<keyof typeof PERMISSIONS>) {
      expect(can("owner", permission), permission).toBe(true);
    }
  });

  it("trainers author training; staff and fleet managers do not", () => {
    expect(can("trainer", "training.author")).toBe(true);
    expect(can("staff", "training.author")).toBe(false);
    expect(can("fleet_manager", "training.author")).toBe(false);
  });

  it("installation records: the counter and the owner write, everyone reads, the owner keeps the checklist", () => {
    expect(["owner", "staff"].every((r) => can(r as never, "installations.edit"))).toBe(true);
    expect(can("fleet_manager", "installations.edit") || can("trainer", "installations.edit")).toBe(false);
    expect(["owner", "staff", "fleet_manager", "trainer"].every((r) => can(r as never, "installations.read"))).toBe(true);
    expect(can("staff", "installations.checklist")).toBe(false);
  });

  it("navigation follows the permissions, and the mailbox only where it is switched on", () => {
    expect(navigationFor("owner", { mailbox: true }).map((i) => i.href)).toEqual(["/overview", "/check", "/checks", "/fleet", "/installations", "/training", "/team", "/settings", "/mailbox"]);
    expect(navigationFor("owner", { mailbox: false }).map((i) => i.href)).toEqual(["/overview", "/check", "/checks", "/fleet", "/installations", "/training", "/team", "/settings"]);
    expect(navigationFor("staff", { mailbox: true }).map((i) => i.href)).toEqual(["/overview", "/check", "/checks", "/fleet", "/installations", "/training"]);
  });
});
