// The committee's whole path in Chromium: a tonal director invites someone by e-mail; the invitee
// follows the link from the message the SMTP stand-in received, sets a password, compares the two
// parish schemes, comments on a stop and records a preference; the tonal director sees the comment,
// its e-mail and the preference summary.
import { expect, test } from "@playwright/test";
import { enlargeScheme, restoreScheme } from "@/db/demo-scenario";
import { invitationLink, waitForMail } from "../support/mail";
import { api, makeUser } from "../support/server";
import { addScheme, openAs, projectWithScheme, uid, whenInteractive } from "./editor-helpers";

test("a committee member is invited, compares the parish schemes, comments on a stop and states a preference", async ({ page, browser }) => {
  test.setTimeout(120_000);
  const designer = await makeUser("designer");
  const { cookie, projectId, schemeId: aId } = await projectWithScheme(designer, restoreScheme, `St Test parish ${uid()}`);
  const b = await addScheme(cookie, projectId, enlargeScheme);
  for (const id of [aId, b.id]) expect((await api(`/api/schemes/${id}`, { method: "PATCH", cookie, body: { sharedWithClient: true } })).status).toBe(200);

  // The tonal director invites a new committee member.
  await openAs(page, designer, `/projects/${projectId}`);
  const email = `churchwarden-${uid()}@parish.example`;
  const invite = page.getByRole("form", { name: "Invite a committee member" });
  await invite.getByLabel("Name").fill("Ada Churchwarden");
  await invite.getByLabel("E-mail").fill(email);
  await invite.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByText(`Invitation sent to ${email}.`)).toBeVisible();
  await expect(page.getByTestId(`invitation-${email}`)).toHaveAttribute("data-state", "pending");

  // The member opens the link from the e-mail as delivered, in a browser of their own.
  const link = await invitationLink(email);
  const member = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const mp = await member.newPage();
  await mp.goto(link);
  await expect(mp.getByRole("heading", { name: "Join the organ committee" })).toBeVisible();
  const password = `pw-${uid()}-choir`;
  await mp.getByLabel("Password (at least 10 characters)").fill(password);
  await mp.getByLabel("The same password again").fill(password);
  await mp.getByRole("button", { name: "Set my password and sign in" }).click();
  await expect(mp).toHaveURL(new RegExp(`/projects/${projectId}$`));
  await expect(mp.getByTestId("user-name")).toHaveText("Ada Churchwarden");
  await whenInteractive(mp);

  // Compare the two schemes: stops marked in words, the Pedal chest of B does not fit, no money.
  await mp.getByTestId("compare-link").click();
  await expect(mp).toHaveURL(new RegExp(`/projects/${projectId}/compare`));
  const stops = mp.getByTestId("compare-stops");
  await expect(stops).toContainText("A — Restore as found");
  await expect(stops).toContainText("B — Rebuild and enlarge");
  await expect(mp.getByTestId("row-gt-mx")).toContainText("added");
  await expect(mp.getByTestId("chest-Pedal").locator('[data-fits="clash"]')).toContainText("does not fit");
  await expect(mp.getByTestId("chart-pipes")).toBeVisible();
  await expect(mp.getByTestId("chart-money")).toHaveCount(0);
  await expect(mp.locator("main")).not.toContainText(/€|Margin|Hours by department/);

  // Comment on one stop of scheme B.
  await mp.goto(`/projects/${projectId}/schemes/${b.id}`);
  await whenInteractive(mp);
  await mp.getByLabel("About").selectOption({ label: "Great: Mixture IV" });
  await mp.getByRole("textbox", { name: "Comment", exact: true }).fill("Could the Mixture be one rank smaller?");
  await mp.getByRole("button", { name: "Post comment" }).click();
  await expect(mp.getByTestId("comment").filter({ hasText: "Could the Mixture be one rank smaller?" })).toContainText("on the Mixture IV (Great)");

  // Record a preference, then change nothing else.
  await mp.goto(`/projects/${projectId}`);
  await whenInteractive(mp);
  await mp.getByRole("radio", { name: "B — Rebuild and enlarge" }).check();
  await mp.getByLabel("Why (optional)").fill("A proper Pedal at last.");
  await mp.getByRole("button", { name: "Record my preference" }).click();
  await expect(mp.getByTestId("my-preference-name")).toHaveText("B — Rebuild and enlarge");
  await member.close();

  // The tonal director is told by e-mail and sees the comment and the summary.
  const told = await waitForMail((m) => m.envelopeTo.includes(designer.email) && m.text.includes("Could the Mixture be one rank smaller?"));
  expect(told.subject).toContain("comment by Ada Churchwarden");
  await page.goto(`/projects/${projectId}/schemes/${b.id}`);
  await expect(page.getByTestId("discussion")).toContainText("Could the Mixture be one rank smaller?");
  await expect(page.getByTestId("discussion")).toContainText("Ada Churchwarden");
  await page.goto(`/projects/${projectId}`);
  await expect(page.getByTestId("preference-of-Ada Churchwarden")).toContainText("B — Rebuild and enlarge");
  await expect(page.getByTestId("preference-count-B — Rebuild and enlarge")).toContainText("1");
  await expect(page.getByTestId(`invitation-${email}`)).toHaveCount(0);
});
