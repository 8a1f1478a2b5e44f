import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseURL, firstLink, latestMailTo, navLabels, openBrowser, PHONE, screenshot, signIn } from "./support/browser";

const SESSION_COOKIE = "__Host-towmargin_session";

type Session = Awaited<ReturnType<typeof openBrowser>>;

const DEMO = {
  owner: "owner@quillfield.example.com",
  staff: "counter@quillfield.example.com",
  trainer: "trainer@quillfield.example.com",
  // The password-reset test changes this account's password: the owner who signed up above, whom no other
  // browser test signs in as (the demo accounts keep their password for the other files).
  signedUp: "odile@larkspur-tow.example.com",
  fleetManager: "fleet@fernhollow.example.com",
};

describe("signing up", () => {
  let visitor: Session;
  beforeAll(async () => {
    visitor = await openBrowser();
  });
  afterAll(async () => visitor.close());

  it("shows field messages for bad input and creates nothing", async () => {
    const { page } = visitor;
    await page.goto("/sign-up");
    await page.getByLabel("E-mail").fill("not-an-address");
    await page.getByRole("button", { name: "Create my organisation" }).click();
    await page.getByText("Enter an e-mail address like name@example.com.").waitFor();
    await screenshot(page, "sign-up-errors-desktop");
    await page.getByText("Enter your name.").waitFor();
    // No password on this form: it is chosen on the page the confirmation link opens.
    await expect.poll(() => page.getByLabel("Password").count()).toBe(0);
  });

  it("mails a confirmation link whose page chooses the password and creates the organisation with its owner", async () => {
    const { page } = visitor;
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Odile Fenwright");
    await page.getByLabel("E-mail").fill("odile@larkspur-tow.example.com");
    await page.getByLabel("Shop or fleet name").fill("Larkspur Tow Supply");
    await page.getByRole("button", { name: "Create my organisation" }).click();
    await page.getByText("Check your inbox at odile@larkspur-tow.example.com").waitFor();

    const mail = await latestMailTo("odile@larkspur-tow.example.com");
    expect(mail.subject).toBe("Finish signing up to Towmargin");
    expect(mail.html).toContain("Finish signing up");
    const confirmLink = firstLink(mail.text, "/sign-up/confirm/");
    await page.goto(confirmLink);
    await page.getByLabel("Choose a password").fill("password1234");
    await page.getByLabel("The same again").fill("password1234");
    await page.getByRole("button", { name: "Finish signing up" }).click();
    // A common password is refused at its field.
    await page.getByText("That password is one of the most common ones").waitFor();
    await page.getByLabel("Choose a password").fill("a long enough passphrase");
    await page.getByLabel("The same again").fill("a long enough passphrase");
    await screenshot(page, "sign-up-confirm-desktop");
    await page.getByRole("button", { name: "Finish signing up" }).click();
    await page.waitForURL(/\/overview/);
    await page.getByRole("heading", { level: 1, name: "Hello, Odile Fenwright" }).waitFor();
    expect(await navLabels(page)).toEqual(["Overview", "Check a rig", "Saved checks", "Fleet", "Installations", "Training", "Team", "Organisation", "Mailbox"]);
  });

  it("answers the same for an address that already has an account", async () => {
    const { context } = visitor;
    const page = await context.newPage();
    await context.clearCookies();
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Someone Else");
    await page.getByLabel("E-mail").fill(DEMO.staff);
    await page.getByLabel("Shop or fleet name").fill("Not Quillfield");
    await page.getByRole("button", { name: "Create my organisation" }).click();
    await page.getByText(`Check your inbox at ${DEMO.staff}: we sent a link to finish signing up.`).waitFor();
    expect((await latestMailTo(DEMO.staff)).subject).toBe("Your Towmargin account");
    await page.close();
  });
});

describe("signing in with each role", () => {
  const cases = [
    { who: "owner", email: DEMO.owner, nav: ["Overview", "Check a rig", "Saved checks", "Fleet", "Installations", "Training", "Team", "Organisation", "Mailbox"], role: "Owner", start: "The team and this month" },
    { who: "counter staff", email: DEMO.staff, nav: ["Overview", "Check a rig", "Saved checks", "Fleet", "Installations", "Training"], role: "Counter staff", start: "Recent checks" },
    { who: "trainer", email: DEMO.trainer, nav: ["Overview", "Check a rig", "Saved checks", "Fleet", "Installations", "Training"], role: "Trainer", start: "Courses and learners" },
    { who: "fleet manager", email: DEMO.fleetManager, nav: ["Overview", "Check a rig", "Saved checks", "Fleet", "Installations", "Training"], role: "Fleet manager", start: "The fleet's pairings" },
  ];

  for (const { who, email, nav, role, start } of cases) {
    it(`the ${who} sees their navigation and is refused pages outside the role`, async () => {
      const session = await openBrowser();
      try {
        const { page } = session;
        await signIn(page, email);
        expect(await navLabels(page)).toEqual(nav);
        await expect.poll(() => page.getByTestId("current-role").innerText()).toContain(role);
        // Each role starts from its own work on the overview.
        await page.getByTestId("role-start").getByRole("heading", { name: start }).waitFor();
        for (const path of ["/team", "/settings", "/mailbox"]) {
          const response = await page.goto(path);
          if (nav.includes("Team")) {
            expect(response?.status(), path).toBe(200);
          } else {
            expect(response?.status(), path).toBe(403);
            // The refusal is drawn when the page's scripts run (a page that calls forbidden() is rendered in the
            // browser from the server's payload), so wait for it rather than asking at the load event.
            await page.getByRole("heading", { name: "This page is not part of your role" }).waitFor();
          }
        }
      } finally {
        await session.close();
      }
    });
  }

  it("gives one message for a wrong password and for an unknown address", async () => {
    const session = await openBrowser();
    try {
      const { page } = session;
      const messages: string[] = [];
      for (const [email, password] of [
        [DEMO.staff, "not the password"],
        ["nobody@quillfield.example.com", "not the password"],
      ] as const) {
        await page.goto("/sign-in");
        await page.getByLabel("E-mail").fill(email);
        await page.getByLabel("Password").fill(password);
        await page.getByRole("button", { name: "Sign in" }).click();
        const status = page.getByRole("status").filter({ hasText: "do not match" });
        await status.waitFor();
        messages.push(await status.innerText());
      }
      expect(messages[0]).toBe("That e-mail and password do not match an account.");
      expect(messages[1]).toBe(messages[0]);
    } finally {
      await session.close();
    }
  });

  it("a way back with a tab between two slashes keeps the person on this site", async () => {
    const session = await openBrowser();
    try {
      const { page } = session;
      await page.goto(`/sign-in?next=${encodeURIComponent("/\t/evil.example.com/landing")}`);
      await page.getByLabel("E-mail").fill(DEMO.trainer);
      await page.getByLabel("Password").fill("towmargin-demo");
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.waitForURL(/\/overview/);
      expect(new URL(page.url()).origin).toBe(new URL(baseURL()).origin);
    } finally {
      await session.close();
    }
  });

  it("sends a signed-out visitor to sign-in and back to the page asked for", async () => {
    const session = await openBrowser();
    try {
      const { page } = session;
      await page.goto("/settings");
      await page.waitForURL(/\/sign-in\?next=%2Fsettings/);
      await page.getByLabel("E-mail").fill(DEMO.owner);
      await page.getByLabel("Password").fill("towmargin-demo");
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.waitForURL(/\/settings$/);
      await page.getByRole("heading", { level: 1, name: "Organisation" }).waitFor();
    } finally {
      await session.close();
    }
  });
});

describe("signing out", () => {
  it("ends the session on the server: the old cookie no longer opens anything", async () => {
    const session = await openBrowser();
    try {
      const { page, context } = session;
      await signIn(page, DEMO.staff);
      // The production build names it with the __Host- prefix: Secure, path /, no domain.
      const cookie = (await context.cookies()).find((c) => c.name === SESSION_COOKIE);
      expect(cookie?.httpOnly).toBe(true);
      expect(cookie?.sameSite).toBe("Lax");
      expect(cookie?.secure).toBe(true);
      expect(cookie?.path).toBe("/");
      await page.getByRole("button", { name: "Sign out" }).click();
      await page.waitForURL(/\/sign-in\?signed-out=1/);

      // Replaying the old cookie must not work: the session is gone from the database.
      const replay = await fetch(new URL("/api/v1/me", page.url()), { headers: { cookie: `${SESSION_COOKIE}=${cookie?.value}` } });
      expect(replay.status).toBe(401);
      const response = await page.goto("/overview");
      expect(response?.url()).toContain("/sign-in");
    } finally {
      await session.close();
    }
  });
});

describe("inviting a member", () => {
  it("the owner invites, the mail arrives, the new trainer joins and sees the trainer's navigation", async () => {
    const owner = await openBrowser();
    const invitee = await openBrowser(PHONE);
    try {
      await signIn(owner.page, DEMO.owner);
      await owner.page.goto("/team");
      await owner.page.getByLabel("E-mail").fill("wren@quillfield.example.com");
      await owner.page.getByLabel("Role", { exact: true }).selectOption("trainer");
      await owner.page.getByRole("button", { name: "Send invitation" }).click();
      await owner.page.getByRole("cell", { name: "wren@quillfield.example.com", exact: true }).waitFor();
      await screenshot(owner.page, "team-desktop");

      const mail = await latestMailTo("wren@quillfield.example.com");
      expect(mail.subject).toBe("You are invited to a team on Towmargin");
      const link = firstLink(mail.text, "/invite/");

      // The owner can read the same message in the development mailbox.
      await owner.page.goto("/mailbox");
      await owner.page.getByRole("link", { name: "You are invited to a team on Towmargin" }).first().click();
      await owner.page.getByText("Text part").waitFor();

      await invitee.page.goto(link);
      await invitee.page.getByRole("heading", { level: 1, name: "Join Quillfield Hitch & Trailer" }).waitFor();
      await invitee.page.getByLabel("Your name").fill("Wren Abernethy");
      await invitee.page.getByLabel("Choose a password").fill("wren's long passphrase");
      await screenshot(invitee.page, "invitation-phone");
      await invitee.page.getByRole("button", { name: "Join" }).click();
      await invitee.page.waitForURL(/\/overview/);
      expect(await navLabels(invitee.page)).toEqual(["Overview", "Check a rig", "Saved checks", "Fleet", "Installations", "Training"]);
      await invitee.page.getByText("You have joined Quillfield Hitch & Trailer.").waitFor();

      // The link works once.
      const second = await openBrowser();
      try {
        await second.page.goto(link);
        await second.page.getByRole("heading", { level: 1, name: "This invitation is no longer open" }).waitFor();
      } finally {
        await second.close();
      }
    } finally {
      await owner.close();
      await invitee.close();
    }
  });
});

describe("resetting a password", () => {
  it("mails a single-use link; the new password works and the old one does not", async () => {
    const session = await openBrowser();
    try {
      const { page } = session;
      await page.goto("/forgot-password");
      await page.getByLabel("E-mail").fill(DEMO.signedUp);
      await page.getByRole("button", { name: "Send me a link" }).click();
      await page.getByText("If an account uses that address").waitFor();
      const link = firstLink((await latestMailTo(DEMO.signedUp, 10_000, "Your Towmargin password")).text, "/reset-password/");
      await page.goto(link);
      await page.getByLabel("New password").fill("odile's new passphrase");
      await page.getByLabel("The same again").fill("odile's new passphrase");
      await page.getByRole("button", { name: "Set the new password" }).click();
      await page.waitForURL(/\/sign-in\?reset=1/);
      await signIn(page, DEMO.signedUp, "odile's new passphrase");
      await page.goto(link);
      await page.getByRole("heading", { level: 1, name: "This link no longer works" }).waitFor();
    } finally {
      await session.close();
    }
  });
});

describe("changing the password while signed in", () => {
  it("needs the current password and signs the account out on its other devices", async () => {
    const here = await openBrowser();
    const elsewhere = await openBrowser(PHONE);
    try {
      await signIn(here.page, DEMO.signedUp, "odile's new passphrase");
      await signIn(elsewhere.page, DEMO.signedUp, "odile's new passphrase");
      await here.page.getByRole("link", { name: "Odile Fenwright" }).click();
      await here.page.getByRole("heading", { level: 1, name: "Your account" }).waitFor();
      await here.page.getByLabel("Current password").fill("not my password at all");
      await here.page.getByLabel("New password").fill("odile's third passphrase");
      await here.page.getByLabel("The new one again").fill("odile's third passphrase");
      await here.page.getByRole("button", { name: "Change the password" }).click();
      await here.page.getByText("That is not your current password.").waitFor();
      await here.page.getByLabel("Current password").fill("odile's new passphrase");
      await here.page.getByRole("button", { name: "Change the password" }).click();
      await here.page.getByText("Your new password is set.").waitFor();
      await screenshot(here.page, "account-desktop");
      // This browser stays signed in; the other device is signed out.
      expect((await here.page.goto("/overview"))?.url()).toContain("/overview");
      expect((await elsewhere.page.goto("/overview"))?.url()).toContain("/sign-in");
      await signIn(elsewhere.page, DEMO.signedUp, "odile's third passphrase");
      await elsewhere.page.goto("/account");
      await screenshot(elsewhere.page, "account-phone");
    } finally {
      await here.close();
      await elsewhere.close();
    }
  });
});

describe("screens", () => {
  it("renders sign-in and the workspace at desktop and phone widths", async () => {
    for (const [label, viewport] of [
      ["desktop", undefined],
      ["phone", PHONE],
    ] as const) {
      const session = await openBrowser(viewport);
      try {
        const { page } = session;
        await page.goto("/sign-in");
        await screenshot(page, `sign-in-${label}`);
        await page.goto("/");
        await screenshot(page, `landing-${label}`);
        await signIn(page, DEMO.owner);
        await screenshot(page, `overview-${label}`);
        await page.goto("/settings");
        await screenshot(page, `settings-${label}`);
        // Nothing wider than the window: the page must not scroll sideways on a phone.
        const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
        expect(overflow).toBeLessThanOrEqual(0);
      } finally {
        await session.close();
      }
    }
  });
});
