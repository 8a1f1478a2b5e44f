import { beforeAll, beforeEach, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-access-${process.pid}-${Date.now()}.db`;
  // Nothing listens here: any mail an action tries to send fails fast instead of leaving the machine.
  process.env.SMTP_PORT = "9";
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { switchTo, signOut } from "@/app/(workspace)/actions";
import { saveSettings } from "@/app/(workspace)/settings/actions";
import { invite, remove, revoke, setRole } from "@/app/(workspace)/team/actions";
import { acceptAsSignedIn } from "@/app/(public)/invite/[token]/actions";
import { GET as getTeam } from "@/app/api/v1/team/route";
import { GET as getMe } from "@/app/api/v1/me/route";
import { initialFormState, type FormState } from "@/lib/validation/form-state";
import { actAs, buildFixture, form, INVITATION_A, ORG_A, ORG_B, sessionOrganisation, snapshot, type Person } from "./support/fixture";
import { NavigationSignal } from "./support/next-mocks";

/** Runs an action and reports whether it was refused (a failed state, or a redirect to sign-in). */
async function outcome(run: () => Promise<FormState | void>): Promise<"refused" | "done"> {
  try {
    const state = await run();
    return state && state.ok === false ? "refused" : "done";
  } catch (error) {
    if (error instanceof NavigationSignal && (error.kind !== "redirect" || error.url?.startsWith("/sign-in"))) return "refused";
    if (error instanceof NavigationSignal) return "done";
    throw error;
  }
}

// Every action aimed at organisation A's records, and who may run it. Source of truth: lib/roles.ts.
const ACTIONS_ON_A: Array<{ name: string; allowed: Person[]; run: () => Promise<FormState | void> }> = [
  { name: "invite a member", allowed: ["ownerA"], run: () => invite(initialFormState, form({ email: "someone@example.com", role: "staff" })) },
  { name: "change a role", allowed: ["ownerA"], run: () => setRole(initialFormState, form({ membershipId: "m-staffA", role: "trainer" })) },
  { name: "remove a member", allowed: ["ownerA"], run: () => remove(initialFormState, form({ membershipId: "m-trainerA" })) },
  { name: "withdraw an invitation", allowed: ["ownerA"], run: () => revoke(initialFormState, form({ invitationId: INVITATION_A.id })) },
  {
    name: "change the organisation's settings",
    allowed: ["ownerA"],
    run: () => saveSettings(initialFormState, form({ name: "Renamed", units: "metric", tightMarginPercent: "12", frontAxleLossPercent: "12", linkLifetimeDays: "180" })),
  },
];

const ACTORS: Array<Person | "anonymous"> = ["anonymous", "staffA", "trainerA", "fleetA", "ownerB"];

describe("server actions refuse who may not use them, and write nothing", () => {
  beforeAll(buildFixture);

  for (const action of ACTIONS_ON_A) {
    for (const actor of ACTORS) {
      if (action.allowed.includes(actor as Person)) continue;
      it(`${action.name}: ${actor}`, async () => {
        await actAs(actor);
        const before = await snapshot();
        const result = await outcome(action.run);
        const after = await snapshot();
        if (actor === "ownerB" && (action.name === "invite a member" || action.name === "change the organisation's settings")) {
          // B's owner acts on B: allowed, and A's records stay as they were.
          expect(JSON.parse(after).organisations.find((o: { id: string }) => o.id === ORG_A)).toEqual(
            JSON.parse(before).organisations.find((o: { id: string }) => o.id === ORG_A),
          );
          expect(JSON.parse(after).memberships).toEqual(JSON.parse(before).memberships);
          return;
        }
        expect(result).toBe("refused");
        expect(after).toBe(before);
      });
    }
  }

  it("accepting an invitation addressed to someone else is refused", async () => {
    await actAs("staffA");
    const before = await snapshot();
    expect(await outcome(() => acceptAsSignedIn(initialFormState, form({ token: INVITATION_A.token })))).toBe("refused");
    expect(await snapshot()).toBe(before);
  });

  it("switching into an organisation one does not belong to leaves the session where it was", async () => {
    await actAs("ownerB");
    await outcome(() => switchTo(form({ organisationId: ORG_A })));
    expect(await sessionOrganisation()).toBe(ORG_B);
  });

  it("signing out with no session changes nothing", async () => {
    await actAs("anonymous");
    const before = await snapshot();
    await outcome(() => signOut());
    expect(await snapshot()).toBe(before);
  });

  // The controls: the same calls do work for the one allowed, so the refusals above are not an accident.
  it("the owner of A can change a role and withdraw the invitation", async () => {
    await actAs("ownerA");
    expect(await outcome(() => setRole(initialFormState, form({ membershipId: "m-staffA", role: "trainer" })))).toBe("done");
    expect(await outcome(() => revoke(initialFormState, form({ invitationId: INVITATION_A.id })))).toBe("done");
    const after = JSON.parse(await snapshot());
    expect(after.memberships.find((m: { id: string }) => m.id === "m-staffA").role).toBe("trainer");
    expect(after.invitations.find((i: { id: string }) => i.id === INVITATION_A.id).revokedAt).not.toBeNull();
  });

  it("the last owner cannot be demoted or removed", async () => {
    await actAs("ownerA");
    const before = await snapshot();
    expect(await outcome(() => setRole(initialFormState, form({ membershipId: "m-ownerA", role: "staff" })))).toBe("refused");
    expect(await outcome(() => remove(initialFormState, form({ membershipId: "m-ownerA" })))).toBe("refused");
    expect(await snapshot()).toBe(before);
  });

  it("bad input gets field errors and writes nothing", async () => {
    await actAs("ownerA");
    const before = await snapshot();
    const state = await saveSettings(initialFormState, form({ name: "", units: "furlongs", tightMarginPercent: "1e309", frontAxleLossPercent: "10", linkLifetimeDays: "180" }));
    expect(state.ok).toBe(false);
    expect(Object.keys(state.fieldErrors ?? {}).sort()).toEqual(["name", "tightMarginPercent", "units"]);
    const inviteState = await invite(initialFormState, form({ email: "<script>@x", role: "admin" }));
    expect(Object.keys(inviteState.fieldErrors ?? {}).sort()).toEqual(["email", "role"]);
    expect(await snapshot()).toBe(before);
  });
});

describe("route handlers", () => {
  beforeEach(() => actAs("anonymous"));

  it("GET /api/v1/team: 401 signed out, 403 for staff, trainer and fleet manager", async () => {
    expect((await getTeam()).status).toBe(401);
    for (const person of ["staffA", "trainerA", "fleetA"] as const) {
      await actAs(person);
      const response = await getTeam();
      expect(response.status, person).toBe(403);
      expect(await response.json()).toEqual({ error: "forbidden", message: "Your role in this organisation does not allow this." });
    }
  });

  it("GET /api/v1/team: an owner sees only their own organisation's people", async () => {
    await actAs("ownerB");
    const body = (await (await getTeam()).json()) as { members: Array<{ email: string }>; pending: Array<{ email: string }> };
    expect(body.members.map((m) => m.email)).toEqual(["ownerb@example.com"]);
    // A's open invitation never shows in B's list (B's own, sent above, may).
    expect(body.pending.map((p) => p.email)).not.toContain("newcomer@example.com");
  });

  it("GET /api/v1/me: 401 signed out; the person's own organisation and role when signed in", async () => {
    const anonymous = await getMe();
    expect(anonymous.status).toBe(401);
    expect(await anonymous.text()).not.toMatch(/at .*\.ts|Error:/);
    await actAs("fleetA");
    const body = (await (await getMe()).json()) as { role: string; organisation: { id: string } };
    expect(body.role).toBe("fleet_manager");
    expect(body.organisation.id).toBe(ORG_A);
  });
});
