// A screen opened while the database is stopped shows Stopwright's own error page, which says the
// database is not answering, and opens the screen by itself once the database is back.
import { execFileSync } from "node:child_process";
import { expect, test } from "@playwright/test";
import { closeTestDb, makeUser } from "../support/server";
import { openAs } from "./editor-helpers";

const cluster = (cmd: "halt" | "resume") => execFileSync("bash", ["scripts/db.sh", cmd, "--test"], { stdio: "pipe" });

test.describe.configure({ timeout: 60_000 });
test.afterAll(async () => {
  cluster("resume");
  await closeTestDb();
});

test("the error page says the database is not answering, then recovers by itself", async ({ page }) => {
  const designer = await makeUser("designer");
  await openAs(page, designer, "/projects");
  await closeTestDb(); // this test's own connections must not span the outage
  cluster("halt");
  try {
    await page.goto("/projects");
    await expect(page.getByTestId("error-database")).toBeVisible({ timeout: 15_000 });
    await expect(page.getByRole("heading", { name: "The database is not answering" })).toBeVisible();
    await page.screenshot({ path: "test-results/outage-error-page.png", fullPage: true });
  } finally {
    cluster("resume");
  }
  // No reload: the page checks the health route every few seconds and opens the screen itself.
  await expect(page.getByRole("heading", { name: "Projects" })).toBeVisible({ timeout: 20_000 });
  await expect(page.getByTestId("error-database")).toHaveCount(0);
});
