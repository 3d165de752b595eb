// No edit is ever lost: leaving by the app's own links saves first; when a save cannot be made the
// editor stops and asks; work that never reached the server (no connection, a conflict, a crashed
// tab) is kept in the browser and offered back; and keyboard moves count every key, however fast.
import { expect, test, type Page } from "@playwright/test";
import { smallDocument } from "../support/fixtures";
import { api, closeTestDb, makeUser, signIn } from "../support/server";
import { expectSaved, openAs, projectWithScheme, renameStop, saveState, schemePath, stopCard } from "./editor-helpers";

test.describe.configure({ timeout: 60_000 });
test.afterAll(closeTestDb);

async function stopNames(cookie: string, schemeId: string) {
  const res = await api(`/api/schemes/${schemeId}`, { cookie });
  const doc = res.json.scheme.document as { divisions: { name: string; stops: { name: string }[] }[] };
  return { version: res.json.scheme.version as number, layout: doc.divisions.map((d) => [d.name, d.stops.map((s) => s.name)]) };
}

/** Saves fail as if the connection were gone (the request never reaches the server). */
async function cutSaves(page: Page) {
  await page.route("**/api/schemes/*", (route) => (route.request().method() === "PUT" ? route.abort("internetdisconnected") : route.continue()));
}

const breadcrumbProjects = (page: Page) => page.getByRole("navigation", { name: "Breadcrumb" }).getByRole("link", { name: "Projects" });

test("leaving by a link within the save delay saves the edit first", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId, cookie } = await projectWithScheme(designer, smallDocument("Leave test"));
  await openAs(page, designer, schemePath(projectId, schemeId));
  await expectSaved(page, 1);
  await renameStop(page, "Principal", "4′", "Octave");
  await expect(saveState(page)).toHaveAttribute("data-state", /unsaved|saving/);
  await breadcrumbProjects(page).click();
  await expect(page).toHaveURL(/\/projects$/);
  expect(await stopNames(cookie, schemeId)).toEqual({ version: 2, layout: [["Great", ["Open Diapason", "Octave", "Twelfth", "Fifteenth"]], ["Pedal", ["Bourdon", "Bass Flute"]]] });
});

test("a save that cannot be made stops the link and asks; leaving keeps the work for the return", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId, cookie } = await projectWithScheme(designer, smallDocument("Offline test"));
  await openAs(page, designer, schemePath(projectId, schemeId));
  await expectSaved(page, 1);
  await cutSaves(page);
  await renameStop(page, "Twelfth", "2⅔′", "Nazard");

  await breadcrumbProjects(page).click();
  const ask = page.getByRole("dialog", { name: "Your latest changes are not saved" });
  await expect(ask).toBeVisible();
  await expect(ask).toContainText("could not be reached");
  await ask.getByRole("button", { name: "Stay on this scheme" }).click();
  await expect(ask).toBeHidden();
  await expect(page).toHaveURL(new RegExp(`/schemes/${schemeId}$`));
  await expect(stopCard(page, "Nazard")).toBeVisible();

  await breadcrumbProjects(page).click();
  await expect(ask).toBeVisible();
  await ask.getByRole("button", { name: "Leave; keep my changes in this browser" }).click();
  await expect(page).toHaveURL(/\/projects$/);
  expect((await stopNames(cookie, schemeId)).version).toBe(1);

  // Back, with the connection restored: the editor offers the work back, and saves it.
  await page.unrouteAll();
  await page.goto(schemePath(projectId, schemeId));
  const banner = page.getByTestId("draft-banner");
  await expect(banner).toContainText(/You have changes from \d\d:\d\d that were not saved — restore them\?/);
  await expect(stopCard(page, "Twelfth")).toBeVisible();
  await banner.getByRole("button", { name: "Restore them" }).click();
  await expect(stopCard(page, "Nazard")).toBeVisible();
  await expectSaved(page, 2);
  expect((await stopNames(cookie, schemeId)).layout[0]).toEqual(["Great", ["Open Diapason", "Principal", "Nazard", "Fifteenth"]]);
  // Saved, so nothing is offered any more.
  await page.reload();
  await expectSaved(page, 2);
  await expect(page.getByTestId("draft-banner")).toHaveCount(0);
});

test("a tab that crashed before its save is offered back on return, and Discard forgets it", async ({ browser }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId, cookie } = await projectWithScheme(designer, smallDocument("Crash test"));
  const context = await browser.newContext();
  const first = await context.newPage();
  await openAs(first, designer, schemePath(projectId, schemeId));
  await expectSaved(first, 1);
  await cutSaves(first);
  await renameStop(first, "Fifteenth", "2′", "Super Octave");
  await expect.poll(() => first.evaluate((id) => window.localStorage.getItem(`stopwright.unsaved.${id}`) ?? "", schemeId)).toContain("Super Octave");
  await first.close({ runBeforeUnload: false });

  const second = await context.newPage();
  await second.goto(schemePath(projectId, schemeId));
  const banner = second.getByTestId("draft-banner");
  await expect(banner).toBeVisible();
  await banner.getByRole("button", { name: "Restore them" }).click();
  await expectSaved(second, 2);
  expect((await stopNames(cookie, schemeId)).layout[0]![1]).toContain("Super Octave");

  // A second crash, this time discarded: the server's version stays, and the offer does not return.
  await cutSaves(second);
  await renameStop(second, "Open Diapason", "8′", "Large Open Diapason");
  await expect.poll(() => second.evaluate((id) => window.localStorage.getItem(`stopwright.unsaved.${id}`) ?? "", schemeId)).toContain("Large Open Diapason");
  await second.close({ runBeforeUnload: false });
  const third = await context.newPage();
  await third.goto(schemePath(projectId, schemeId));
  await third.getByTestId("draft-banner").getByRole("button", { name: "Discard them" }).click();
  await expect(third.getByTestId("draft-banner")).toHaveCount(0);
  await third.reload();
  await expectSaved(third, 2);
  await expect(third.getByTestId("draft-banner")).toHaveCount(0);
  await expect(stopCard(third, "Open Diapason")).toBeVisible();
  await context.close();
});

test("work caught in a conflict is asked about on leaving, and restored later through the conflict choice", async ({ browser }) => {
  const first = await makeUser("designer");
  const second = await makeUser("designer");
  const { projectId, schemeId, cookie } = await projectWithScheme(first, smallDocument("Conflict leave test"));
  const pageA = await (await browser.newContext()).newPage();
  const pageB = await (await browser.newContext()).newPage();
  await openAs(pageA, first, schemePath(projectId, schemeId));
  await openAs(pageB, second, schemePath(projectId, schemeId));
  await renameStop(pageA, "Principal", "4′", "Octave");
  await expectSaved(pageA, 2);
  await renameStop(pageB, "Bourdon", "16′", "Subbass");
  await expect(saveState(pageB)).toHaveAttribute("data-state", "conflict", { timeout: 15_000 });

  await breadcrumbProjects(pageB).click();
  const ask = pageB.getByRole("dialog", { name: "Your latest changes are not saved" });
  await expect(ask).toContainText("Someone else saved version 2");
  await ask.getByRole("button", { name: "Leave; keep my changes in this browser" }).click();
  await expect(pageB).toHaveURL(/\/projects$/);

  await pageB.goto(schemePath(projectId, schemeId));
  const banner = pageB.getByTestId("draft-banner");
  await expect(banner).toContainText("They were made on version 1; the scheme is now at version 2");
  await banner.getByRole("button", { name: "Restore them" }).click();
  await expect(pageB.getByTestId("conflict-banner")).toBeVisible({ timeout: 15_000 });
  await pageB.getByRole("button", { name: "Keep mine and save over" }).click();
  await expectSaved(pageB, 3);
  const saved = await stopNames(await signIn(second), schemeId);
  expect(saved.layout[1]![1]).toContain("Subbass");
  expect((await stopNames(cookie, schemeId)).version).toBe(3);
});

test("keyboard moves pressed in quick succession all count", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId, cookie } = await projectWithScheme(designer, smallDocument("Quick keys test"));
  await openAs(page, designer, schemePath(projectId, schemeId));
  await expectSaved(page, 1);
  const handle = page.getByRole("button", { name: "Move Open Diapason 8′", exact: true });
  await handle.focus();
  // No waits between keys: down three places to the end of the Great, dropped; up one, dropped; then
  // over to the Pedal (at the same place, here its end) and up one, dropped.
  for (const key of ["Space", "ArrowDown", "ArrowDown", "ArrowDown", "Space", "Space", "ArrowUp", "Space", "Space", "ArrowRight", "ArrowUp", "Space"]) {
    await page.keyboard.press(key);
  }
  await expect(stopCard(page, "Open Diapason")).toHaveAttribute("data-division", "Pedal");
  await expect(page.getByTestId("division-Pedal").locator("[data-testid^=stop-]")).toHaveText([/Bourdon/, /Open Diapason/, /Bass Flute/]);
  await expect(page.getByTestId("division-Great").locator("[data-testid^=stop-]")).toHaveText([/Principal/, /Twelfth/, /Fifteenth/]);
  await expect(handle).toBeFocused();
  await expect.poll(async () => (await stopNames(cookie, schemeId)).layout, { timeout: 15_000 }).toEqual([
    ["Great", ["Principal", "Twelfth", "Fifteenth"]],
    ["Pedal", ["Bourdon", "Open Diapason", "Bass Flute"]],
  ]);

  // Escape puts a carried stop back where it was.
  await page.keyboard.press("Space");
  await page.keyboard.press("ArrowLeft");
  await page.keyboard.press("Escape");
  await expect(stopCard(page, "Open Diapason")).toHaveAttribute("data-division", "Pedal");
});
