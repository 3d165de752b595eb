// The app passes its own Content-Security-Policy: signed in as each role that uses them, the
// screens load, hydrate and work (sign-in, the editor's live figures, the users page) with no
// script or style refused by the policy.
import { expect, test, type Page } from "@playwright/test";
import { smallDocument } from "../support/fixtures";
import { closeTestDb, makeUser } from "../support/server";
import { signInAs } from "./helpers";
import { openAs, projectWithScheme, schemePath } from "./editor-helpers";

test.describe.configure({ timeout: 60_000 });
test.afterAll(closeTestDb);

/** Collects every CSP violation the page reports, from the event and from the console. */
async function watchPolicy(page: Page): Promise<string[]> {
  const violations: string[] = [];
  page.on("console", (m) => {
    if (/Content Security Policy|Refused to (?:execute|load|apply|evaluate)/i.test(m.text())) violations.push(m.text());
  });
  await page.exposeFunction("__cspViolation", (v: string) => violations.push(v));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      (window as unknown as { __cspViolation: (v: string) => void }).__cspViolation(`${e.violatedDirective} ${e.blockedURI}`);
    });
  });
  return violations;
}

test("sign-in and the designer's screens run under the policy", async ({ page }) => {
  const violations = await watchPolicy(page);
  const designer = await makeUser("designer");
  // The sign-in form itself (its script posts the credentials).
  await signInAs(page, designer, "/projects");
  const { projectId, schemeId } = await projectWithScheme(designer, smallDocument());
  await page.goto(`/projects/${projectId}`);
  await expect(page.getByTestId("project-name")).toBeVisible();
  await page.goto(schemePath(projectId, schemeId));
  // Live figures are computed by the page's scripts: they show only if the scripts ran.
  await expect(page.locator('[data-testid="figures"][data-state="ok"]')).toBeVisible();
  await page.goto(`${schemePath(projectId, schemeId)}/chests`);
  await page.goto(`${schemePath(projectId, schemeId)}/stop-list`);
  await page.goto("/no-such-page");
  await expect(page.getByTestId("not-found")).toBeVisible();
  expect(violations).toEqual([]);
});

test("the administrator's users page runs under the policy", async ({ page }) => {
  const violations = await watchPolicy(page);
  const admin = await makeUser("admin");
  await openAs(page, admin, "/admin/users");
  await expect(page.getByTestId("users-table")).toBeVisible();
  expect(violations).toEqual([]);
});
