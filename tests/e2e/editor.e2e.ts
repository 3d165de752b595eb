import { expect, test } from "@playwright/test";
import { smallDocument } from "../support/fixtures";
import { api, closeTestDb, makeUser, signIn } from "../support/server";
import {
  addDivision,
  addScheme,
  addStop,
  expectSaved,
  fillSpace,
  keyboardMove,
  openAs,
  projectWithScheme,
  renameStop,
  savedVersion,
  saveState,
  schemePath,
  stopCard,
  uid,
} from "./editor-helpers";

test.describe.configure({ timeout: 60_000 });
test.afterAll(closeTestDb);

const UUID = "[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}";

test("a designer drafts a scheme in the browser, moves a stop with the keyboard, and finds it saved", async ({ page }) => {
  const designer = await makeUser("designer");
  await openAs(page, designer, "/projects");

  // A project from the projects page.
  const projectName = `Invented chapel organ ${uid()}`;
  const newProject = page.getByRole("form", { name: "New project" });
  await newProject.getByLabel("Project name").fill(projectName);
  await newProject.getByLabel("Client").fill("Invented chapel trustees");
  await newProject.getByRole("button", { name: "Create project" }).click();
  await expect(page).toHaveURL(new RegExp(`/projects/${UUID}$`));
  await expect(page.getByTestId("project-name")).toHaveText(projectName);
  const projectId = new URL(page.url()).pathname.split("/")[2]!;

  // A scheme from the project page.
  await page.getByRole("textbox", { name: "New scheme" }).fill("Scheme A");
  await page.getByRole("button", { name: "Create scheme" }).click();
  await expect(page).toHaveURL(new RegExp(`/projects/${projectId}/schemes/${UUID}$`));
  const schemeId = new URL(page.url()).pathname.split("/")[4]!;
  await expect(page.getByTestId("scheme-name")).toHaveText("Scheme A");
  await expectSaved(page, 1);

  // Divisions: a manual and the pedals, each with the usual compass of its keyboard.
  await addDivision(page, { name: "Great", keyboard: "manual" });
  await addDivision(page, { name: "Pedal", keyboard: "pedal" });
  await expect(page.getByTestId("division-Great")).toContainText("C–c′′′′");
  await expect(page.getByTestId("division-Pedal")).toContainText("C–g′");

  // Stops: one typed in, two from presets.
  await addStop(page, "Great", { name: "Open Diapason", footage: "8" });
  await addStop(page, "Great", { preset: "Trumpet 8′" });
  await addStop(page, "Pedal", { preset: "Bourdon 16′" });
  const trumpet = stopCard(page, "Trumpet");
  await expect(trumpet).toHaveAttribute("data-division", "Great");
  await expect(trumpet).toContainText("8′");
  await expect(page.getByTestId("division-Pedal").getByTestId("stop-Bourdon")).toContainText("16′");

  // 61 + 61 pipes on the Great, 32 on the Pedal.
  const figures = page.getByTestId("figures");
  await expect(figures).toHaveAttribute("data-state", "ok");
  await expect(page.getByTestId("fig-pipes")).toHaveText("154");
  await expect(page.getByTestId("division-Great")).toContainText("122 pipes");
  await expect(page.getByTestId("division-Pedal")).toContainText("32 pipes");
  const before = await savedVersion(page);

  // The Trumpet to the Pedal, without a mouse.
  await keyboardMove(page, "Move Trumpet 8′", ["ArrowRight"]);
  await expect(trumpet).toHaveAttribute("data-division", "Pedal");
  await expect(page.getByTestId("division-Pedal").getByTestId("stop-Trumpet")).toBeVisible();
  await expect(page.getByTestId("division-Great").getByTestId("stop-Trumpet")).toHaveCount(0);
  await expect(page.getByTestId("last-edit")).toHaveText("Moved Trumpet 8′ from the Great to the Pedal");

  // The figures follow: the Trumpet now has the pedal's 32 notes.
  await expect(trumpet).toContainText("32 pipes");
  await expect(page.getByTestId("fig-pipes")).toHaveText("125");
  await expect(page.getByTestId("division-Great")).toContainText("61 pipes");
  await expect(page.getByTestId("division-Pedal")).toContainText("64 pipes");
  // The move is saved as the next version.
  await expectSaved(page, before + 1);

  // Saved: after a reload the Trumpet is still on the Pedal, and so says the server.
  await page.reload();
  await expect(stopCard(page, "Trumpet")).toHaveAttribute("data-division", "Pedal");
  await expect(page.getByTestId("division-Pedal").getByTestId("stop-Trumpet")).toBeVisible();
  await expect(page.getByTestId("fig-pipes")).toHaveText("125");
  await expectSaved(page, before + 1);

  const read = await api(`/api/schemes/${schemeId}`, { cookie: await signIn(designer) });
  const names = (read.json.scheme.document.divisions as { name: string; stops: { name: string }[] }[]).map((d) => [d.name, d.stops.map((s) => s.name).sort()]);
  expect(names).toEqual([["Great", ["Open Diapason"]], ["Pedal", ["Bourdon", "Trumpet"]]]);
});

test("a stop dragged with the mouse lands where the line shows, and the drop shows its figures at once", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId } = await projectWithScheme(designer, smallDocument("Scheme A"));
  await openAs(page, designer, schemePath(projectId, schemeId));
  const figures = page.getByTestId("figures");
  await expect(figures).toHaveAttribute("data-state", "ok");
  await expect(figures).not.toHaveAttribute("data-stale", /.*/);
  const twelfth = page.locator('[data-stop-id="gt-12"]');
  await expect(twelfth).toContainText("61 pipes");
  const pipesBefore = Number((await page.getByTestId("fig-pipes").textContent())!.replace(/\D/g, ""));

  // Pressed, carried over the Pedal's column in small steps, the line showing where it would go.
  const grip = twelfth.getByRole("button", { name: "Move Twelfth 2⅔′" });
  const from = (await grip.boundingBox())!;
  const to = (await page.getByTestId("division-Pedal").locator("ol").boundingBox())!;
  await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
  await page.mouse.down();
  for (let i = 1; i <= 15; i++) await page.mouse.move(from.x + ((to.x + to.width / 2 - from.x) * i) / 15, from.y + ((to.y + to.height - 4 - from.y) * i) / 15);
  await expect(page.getByTestId("division-Pedal").getByTestId("drop-line")).toBeVisible();
  await expect(twelfth).toHaveAttribute("data-dragging", "");
  // While it is carried the figures stay those of the scheme as it stands.
  await expect(figures).not.toHaveAttribute("data-stale", /.*/);
  await page.waitForTimeout(400);

  // What the first frame after the release shows: the figures of where it landed, not marked stale.
  await page.evaluate(() => {
    document.addEventListener(
      "pointerup",
      () => requestAnimationFrame(() => {
        const f = document.querySelector('[data-testid="figures"]')!;
        (window as unknown as { __atDrop: unknown }).__atDrop = { stale: f.hasAttribute("data-stale"), pipes: document.querySelector('[data-testid="fig-pipes"]')!.textContent };
      }),
      { capture: true, once: true },
    );
  });
  await page.mouse.up();
  const moved = page.getByTestId("division-Pedal").locator('[data-stop-id="gt-12"]');
  await expect(moved).toContainText("32 pipes");
  await expect(page.getByTestId("last-edit")).toHaveText("Moved Twelfth 2⅔′ from the Great to the Pedal");
  await expect(page.locator("[data-dragging]")).toHaveCount(0);
  const atDrop = await page.evaluate(() => (window as unknown as { __atDrop: { stale: boolean; pipes: string } }).__atDrop);
  expect(atDrop).toEqual({ stale: false, pipes: String(pipesBefore - 61 + 32) });
  await expect(page.getByTestId("fig-pipes")).toHaveText(String(pipesBefore - 61 + 32));
  await expectSaved(page, 2);

  // A division carried with the keyboard: the Pedal before the Great, the figures unchanged.
  await keyboardMove(page, "Move division Pedal", ["ArrowLeft"]);
  await expect(page.getByTestId("last-edit")).toHaveText("Moved the Pedal");
  await expect(page.locator("section[data-division-id]").first()).toHaveAttribute("data-testid", "division-Pedal");
  await expect(figures).not.toHaveAttribute("data-stale", /.*/);
  await expect(page.getByTestId("fig-pipes")).toHaveText(String(pipesBefore - 61 + 32));
  await expectSaved(page, 3);
});

test.describe("two designers save the same scheme", () => {
  async function twoEditors(browser: import("@playwright/test").Browser) {
    const first = await makeUser("designer");
    const second = await makeUser("designer");
    const { projectId, schemeId } = await projectWithScheme(first, smallDocument("Scheme A"));
    const pageA = await (await browser.newContext()).newPage();
    const pageB = await (await browser.newContext()).newPage();
    await openAs(pageA, first, schemePath(projectId, schemeId));
    await openAs(pageB, second, schemePath(projectId, schemeId));
    await expectSaved(pageA, 1);
    await expectSaved(pageB, 1);

    // The first saves an edit: the Principal becomes an Octave (version 2).
    await renameStop(pageA, "Principal", "4′", "Octave");
    await expectSaved(pageA, 2);

    // The second, still on version 1, renames the Fifteenth and saves: a conflict.
    await renameStop(pageB, "Fifteenth", "2′", "Super Octave");
    await expect(saveState(pageB)).toHaveAttribute("data-state", "conflict", { timeout: 15_000 });
    const banner = pageB.getByTestId("conflict-banner");
    await expect(banner).toContainText("Someone else saved version 2");
    // Nothing is lost yet: the second's edit is still on the board.
    await expect(stopCard(pageB, "Super Octave")).toBeVisible();
    return { first, second, projectId, schemeId, pageA, pageB, banner };
  }

  test("loading their version shows their change, and Undo brings mine back", async ({ browser }) => {
    const { pageA, pageB, banner, schemeId, second } = await twoEditors(browser);

    await banner.getByRole("button", { name: "Load their version" }).click();
    await expect(banner).toBeHidden();
    await expectSaved(pageB, 2);
    await expect(stopCard(pageB, "Octave")).toBeVisible();
    await expect(stopCard(pageB, "Fifteenth")).toBeVisible();
    await expect(stopCard(pageB, "Super Octave")).toHaveCount(0);

    // Mine is one Undo away, and saves on top of theirs.
    await pageB.getByRole("button", { name: "↶ Undo" }).click();
    await expect(stopCard(pageB, "Super Octave")).toBeVisible();
    await expectSaved(pageB, 3);
    const read = await api(`/api/schemes/${schemeId}`, { cookie: await signIn(second) });
    expect(read.json.scheme.version).toBe(3);
    expect(read.json.scheme.document.divisions[0].stops.map((s: { name: string }) => s.name)).toContain("Super Octave");
    await pageA.context().close();
    await pageB.context().close();
  });

  test("keeping mine saves it as a new version, and theirs stays in the revisions", async ({ browser }) => {
    const { pageA, pageB, banner, schemeId, second } = await twoEditors(browser);

    await banner.getByRole("button", { name: "Keep mine and save over" }).click();
    await expect(banner).toBeHidden();
    await expectSaved(pageB, 3);
    await expect(stopCard(pageB, "Super Octave")).toBeVisible();

    // Theirs is version 2 in the revisions list, with its words.
    await pageB.getByRole("button", { name: "Revisions" }).click();
    const revisions = pageB.getByTestId("revisions");
    await expect(revisions.getByTestId("revision-3")).toContainText("current");
    await expect(revisions.getByTestId("revision-2")).toContainText("Changed Octave 4′");
    await expect(revisions.getByTestId("revision-2").getByRole("button", { name: "Restore version 2" })).toBeVisible();
    const cookie = await signIn(second);
    const theirs = await api(`/api/schemes/${schemeId}/revisions/2`, { cookie });
    expect(theirs.json.revision.document.divisions[0].stops.map((s: { name: string }) => s.name)).toEqual(["Open Diapason", "Octave", "Twelfth", "Fifteenth"]);

    // The first designer, reloading, sees the second's version.
    await pageA.reload();
    await expectSaved(pageA, 3);
    await expect(stopCard(pageA, "Super Octave")).toBeVisible();
    await pageA.context().close();
    await pageB.context().close();
  });
});

test("restoring an earlier revision brings the document back as a new version", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId } = await projectWithScheme(designer, smallDocument("Scheme R"));
  await openAs(page, designer, schemePath(projectId, schemeId));
  await expectSaved(page, 1);

  // Delete the Twelfth (version 2).
  await page.getByRole("button", { name: "Edit Twelfth 2⅔′" }).click();
  const dialog = page.getByRole("dialog", { name: "Twelfth 2⅔′ — Great" });
  await dialog.getByRole("button", { name: "Delete stop" }).click();
  await expect(stopCard(page, "Twelfth")).toHaveCount(0);
  await expectSaved(page, 2);

  await page.getByRole("button", { name: "Revisions" }).click();
  const revisions = page.getByTestId("revisions");
  await expect(revisions.getByTestId("revision-2")).toContainText("current");
  await expect(revisions.getByTestId("revision-2")).toContainText("Deleted Twelfth 2⅔′ from the Great");
  await revisions.getByTestId("revision-1").getByRole("button", { name: "Restore version 1" }).click();
  await revisions.getByRole("button", { name: "Restore v1 as v3" }).click();

  await expect(stopCard(page, "Twelfth")).toHaveAttribute("data-division", "Great");
  await expectSaved(page, 3);
  await expect(revisions.getByTestId("revision-3")).toContainText("restored version 1");
  await expect(revisions.getByTestId("revision-3")).toContainText("current");
  await expect(revisions.locator("[data-testid^=revision-]")).toHaveCount(3);

  await page.reload();
  await expect(page.getByTestId("division-Great").getByTestId("stop-Twelfth")).toBeVisible();
  await expectSaved(page, 3);
});

test("restoring a revision after someone else saved offers the conflict choice instead of overwriting", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId, cookie } = await projectWithScheme(designer, smallDocument("Scheme RC"));
  await openAs(page, designer, schemePath(projectId, schemeId));
  await expectSaved(page, 1);
  await page.getByRole("button", { name: "Edit Twelfth 2⅔′" }).click();
  await page.getByRole("dialog", { name: "Twelfth 2⅔′ — Great" }).getByRole("button", { name: "Delete stop" }).click();
  await expectSaved(page, 2);

  // A colleague saves version 3 behind this page's back.
  const theirs = (await api(`/api/schemes/${schemeId}`, { cookie })).json.scheme.document;
  theirs.divisions[0].stops[0].name = "Large Open Diapason";
  expect((await api(`/api/schemes/${schemeId}`, { method: "PUT", cookie, body: { version: 2, document: theirs } })).status).toBe(200);

  await page.getByRole("button", { name: "Revisions" }).click();
  const revisions = page.getByTestId("revisions");
  await revisions.getByTestId("revision-1").getByRole("button", { name: "Restore version 1" }).click();
  await revisions.getByRole("button", { name: /Restore v1 as v/ }).click();
  await expect(page.getByTestId("conflict-banner")).toContainText("version 3");
  await expect(saveState(page)).toHaveAttribute("data-state", "conflict");
  await page.getByTestId("conflict-banner").getByRole("button", { name: /Load their version/ }).click();
  await expect(stopCard(page, "Large Open Diapason")).toBeVisible();
  await expectSaved(page, 3);
  // Nothing was overwritten: version 3 is still theirs.
  expect((await api(`/api/schemes/${schemeId}`, { cookie })).json.scheme.version).toBe(3);
});

test("the stop list shows the divisions with their compass, the stops numbered with typeset pitches, and the couplers", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId } = await projectWithScheme(designer, smallDocument("Scheme L"));
  await openAs(page, designer, schemePath(projectId, schemeId));

  // One more entered in the editor: a Tierce at the end of the Great.
  await addStop(page, "Great", { preset: "Tierce 1⅗′" });
  await expectSaved(page, 2);
  await page.getByRole("link", { name: "Stop list" }).click();
  await expect(page).toHaveURL(new RegExp(`${schemePath(projectId, schemeId)}/stop-list$`));

  const list = page.getByTestId("stop-list");
  const great = list.getByTestId("list-division-Great");
  const pedal = list.getByTestId("list-division-Pedal");
  await expect(great.getByRole("heading", { name: "Great" })).toBeVisible();
  await expect(great).toContainText("C–c′′′′");
  await expect(pedal.getByRole("heading", { name: "Pedal" })).toBeVisible();
  await expect(pedal).toContainText("C–g′");

  const row = (name: string) => list.getByTestId(`list-stop-${name}`).getByRole("cell");
  await expect(row("Open Diapason")).toHaveText(["1.", "Open Diapason", "8′", "New"]);
  await expect(row("Principal").nth(2)).toHaveText("4′");
  await expect(row("Twelfth").first()).toHaveText("3.");
  await expect(row("Twelfth").nth(2)).toHaveText("2⅔′");
  await expect(row("Fifteenth").nth(2)).toHaveText("2′");
  await expect(row("Tierce").first()).toHaveText("5.");
  await expect(row("Tierce").nth(2)).toHaveText("1⅗′");
  await expect(row("Bourdon").first()).toHaveText("6.");
  await expect(row("Bourdon").nth(2)).toHaveText("16′");
  await expect(row("Bass Flute").first()).toHaveText("7.");
  await expect(row("Bass Flute").nth(1)).toHaveText("Bass Flute (extension of no. 6)");

  const accessories = list.getByTestId("list-accessories");
  await expect(accessories.getByRole("heading", { name: "Couplers and accessories" })).toBeVisible();
  await expect(accessories.getByRole("row")).toHaveText([/8\.\s*Great to Pedal/]);
});

test.describe("read-only roles", () => {
  async function sharedAndUnshared() {
    const designer = await makeUser("designer");
    const { cookie, projectId, schemeId } = await projectWithScheme(designer, smallDocument("Shared scheme"));
    const hidden = await addScheme(cookie, projectId, smallDocument("Unshared scheme"));
    expect((await api(`/api/schemes/${schemeId}`, { method: "PATCH", cookie, body: { sharedWithClient: true } })).status).toBe(200);
    return { cookie, projectId, schemeId, hiddenId: hidden.id as string };
  }

  async function expectNoEditing(page: import("@playwright/test").Page) {
    await expect(page.getByTestId("board")).toBeVisible();
    await expect(stopCard(page, "Open Diapason")).toBeVisible();
    await expect(saveState(page)).toHaveAttribute("data-state", "read-only");
    await expect(page.getByRole("button", { name: /^Move / })).toHaveCount(0);
    await expect(page.getByRole("button", { name: /^Add a stop/ })).toHaveCount(0);
    await expect(page.getByRole("button", { name: /^Edit / })).toHaveCount(0);
    await expect(page.getByRole("button", { name: "+ Add division" })).toHaveCount(0);
    await expect(page.getByRole("button", { name: /Undo|Redo|Save now|Rename/ })).toHaveCount(0);
  }

  for (const [role, who] of [["estimator", "an estimator"], ["workshop", "a workshop user"]] as const) {
    test(`${who} reads a scheme with no handles and no add or edit buttons`, async ({ page }) => {
      const { projectId, hiddenId } = await sharedAndUnshared();
      // The firm's people see every scheme, shared or not.
      await openAs(page, await makeUser(role), schemePath(projectId, hiddenId));
      await expect(page.getByTestId("scheme-name")).toHaveText("Unshared scheme");
      await expectNoEditing(page);
      await expect(page.getByTestId("fig-pipes")).not.toBeEmpty();
      // Estimators price; the workshop does not see money.
      await expect(page.getByTestId("fig-money")).toHaveCount(role === "estimator" ? 1 : 0);
      if (role === "estimator") {
        // The money lines shown add up, to the cent, to the total shown (the brief's rule).
        const values = await page.getByTestId("money-lines").locator("dd").allTextContents();
        const cents = values.map((v) => Number(v.replace(/[^\d]/g, "")));
        expect(cents.length).toBe(8); // labour, materials, bought in and site, overheads, contingency, margin, tax; total
        expect(cents.slice(0, -1).reduce((a, b) => a + b, 0)).toBe(cents.at(-1));
        expect(cents.at(-1)).toBeGreaterThan(0);
      }
      // Revisions are open to read, not to restore.
      await page.getByRole("button", { name: "Revisions" }).click();
      await expect(page.getByTestId("revision-1")).toBeVisible();
      await expect(page.getByRole("button", { name: /^Restore/ })).toHaveCount(0);
    });
  }

  test("a client member sees the shared scheme read-only and without money, and not the unshared one", async ({ page }) => {
    const { cookie, projectId, schemeId, hiddenId } = await sharedAndUnshared();
    const client = await makeUser("client");
    expect((await api(`/api/projects/${projectId}/members`, { method: "POST", cookie, body: { email: client.email } })).status).toBe(200);

    // Home lists the project, counting only what is shared with the committee.
    await openAs(page, client, "/");
    await expect(page.locator('[data-testid^="home-project-"]')).toHaveCount(1);
    await expect(page.locator('[data-testid^="home-project-"]')).toContainText("1 scheme shared with you");

    await page.goto(`/projects/${projectId}`);
    const schemes = page.getByTestId("schemes-table");
    await expect(schemes.getByTestId("scheme-Shared scheme")).toBeVisible();
    await expect(schemes.getByTestId("scheme-Unshared scheme")).toHaveCount(0);
    // The committee sees who is on the project, by name (and the firm's people by role), no e-mails.
    await expect(page.getByTestId("committee-people")).toContainText("Test client");
    await expect(page.getByTestId("firm-people")).toContainText("Tonal director");
    for (const list of ["committee-people", "firm-people"]) await expect(page.getByTestId(list)).not.toContainText(/@|·/);

    await schemes.getByRole("link", { name: "Shared scheme" }).click();
    await expect(page).toHaveURL(new RegExp(`${schemePath(projectId, schemeId)}$`));
    // The committee's own page of the scheme: no board, nothing to edit.
    await expect(page.getByTestId("board")).toHaveCount(0);
    await expect(page.getByRole("button", { name: /Undo|Redo|Save now|Rename|\+ Add division/ })).toHaveCount(0);
    // The committee reads the stop list and the headline figures, not the firm's working figures, money or history.
    await expect(page.getByTestId("stop-list")).toContainText("Open Diapason");
    await expect(page.getByTestId("headline-figures")).toContainText("Pipes");
    await expect(page.getByTestId("figures")).toHaveCount(0);
    await expect(page.getByTestId("fig-money")).toHaveCount(0);
    await expect(page.locator("main")).not.toContainText(/Total with tax|Labour|£|€|\$|\b(EUR|GBP|USD|CHF)\b/);
    await expect(page.getByRole("button", { name: "Revisions" })).toHaveCount(0);

    await page.goto(schemePath(projectId, hiddenId));
    await expect(page.getByTestId("not-found")).toBeVisible();
    await expect(page.getByTestId("scheme-name")).toHaveCount(0);
    await page.goto(`${schemePath(projectId, hiddenId)}/stop-list`);
    await expect(page.getByTestId("not-found")).toBeVisible();
    await expect(page.getByTestId("stop-list")).toHaveCount(0);
  });

  test("a client who is not a member finds neither the project nor its shared scheme", async ({ page }) => {
    const { projectId, schemeId } = await sharedAndUnshared();
    await openAs(page, await makeUser("client"), schemePath(projectId, schemeId));
    await expect(page.getByTestId("not-found")).toBeVisible();
    await expect(page.getByTestId("board")).toHaveCount(0);
  });
});

test("a chest that does not fit its space is said so in words and drawn so", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId } = await projectWithScheme(designer, smallDocument("Scheme F"));
  await openEditorAs(page, designer, projectId, schemeId);
  await expect(page.getByTestId("fit-Great")).toHaveAttribute("data-fits", "unknown");
  await expect(page.getByTestId("fit-warning")).toHaveCount(0);

  // A small space for the Great, through its form.
  await page.getByRole("button", { name: "Edit division Great" }).click();
  const dialog = page.getByRole("dialog", { name: "Division: Great" });
  await fillSpace(dialog, { lengthMm: 400, depthMm: 300 });
  await dialog.getByRole("button", { name: "Apply" }).click();
  await expect(dialog).toBeHidden();

  await expect(page.getByTestId("fit-Great")).toHaveAttribute("data-fits", "clash");
  await expect(page.getByTestId("fit-Great")).toHaveText("Chest does not fit");
  await expect(page.getByTestId("fit-warning")).toHaveText("Does not fit: the Great chest.");
  const words = page.getByTestId("figures-chest-Great");
  await expect(words).toHaveAttribute("data-fits", "clash");
  await expect(words).toContainText(/space 400 × 300 mm — does not fit by [\d\u202f]+ mm in length/);
  await expect(page.getByTestId("figures-chest-Pedal")).toHaveAttribute("data-fits", "unknown");
  await expectSaved(page, 2);

  // The drawing says it too.
  await page.getByRole("tab", { name: "Chests" }).click();
  const chest = page.getByTestId("chest-Great");
  await expect(page.getByTestId("chest-words-Great")).toContainText("does not fit");
  await expect(chest.getByTestId("chest-plan-Great")).toHaveAccessibleName(/^Chest of the Great: .*does not fit/);
  await expect(page.getByTestId("chest-space-Great")).toHaveAttribute("data-fits", "no");
  await expect(page.getByTestId("chest-words-Pedal")).toContainText("space in the case not yet given");

  // Room enough, and the warning goes.
  await page.getByRole("tab", { name: "Divisions and stops" }).click();
  await page.getByRole("button", { name: "Edit division Great" }).click();
  await fillSpace(dialog, { lengthMm: 9000, depthMm: 4000 });
  await dialog.getByRole("button", { name: "Apply" }).click();
  await expect(page.getByTestId("fit-Great")).toHaveAttribute("data-fits", "fit");
  await expect(page.getByTestId("fit-warning")).toHaveCount(0);
  await page.getByRole("tab", { name: "Chests" }).click();
  await expect(page.getByTestId("chest-words-Great")).toContainText("fits");
  await expect(page.getByTestId("chest-words-Great")).not.toContainText("does not fit");
  await expectSaved(page, 3);
});

test("a scheme made with a tight space through the API shows the pedal chest does not fit", async ({ page }) => {
  const designer = await makeUser("designer");
  const doc = smallDocument("Scheme T");
  doc.divisions![1]!.space = { lengthMm: 500, depthMm: 200 };
  const { projectId, schemeId } = await projectWithScheme(designer, doc);
  await openEditorAs(page, designer, projectId, schemeId);
  await expect(page.getByTestId("fit-Pedal")).toHaveAttribute("data-fits", "clash");
  await expect(page.getByTestId("fit-warning")).toHaveText("Does not fit: the Pedal chest.");
  await page.getByRole("tab", { name: "Chests" }).click();
  await expect(page.getByTestId("chest-words-Pedal")).toContainText(/space 500 × 200 mm — does not fit by/);
});

async function openEditorAs(page: import("@playwright/test").Page, user: Awaited<ReturnType<typeof makeUser>>, projectId: string, schemeId: string) {
  await openAs(page, user, schemePath(projectId, schemeId));
  await expect(page.getByTestId("scheme-name")).toBeVisible();
}
