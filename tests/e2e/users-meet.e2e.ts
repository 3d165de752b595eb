// The product as each role meets it: the division form keeps a wrong compass in the form and asks
// about an unusual wind, destructive actions ask first, the workshop opens a stop to read it, the
// estimator sets a project's status from details shown as text, and no page scrolls sideways at
// phone width (390 × 844, a common phone's viewport in CSS pixels).
import { expect, test, type Page } from "@playwright/test";
import { restoreScheme } from "@/db/demo-scenario";
import { api, makeUser, signIn } from "../support/server";
import { addScheme, openAs, projectWithScheme, schemePath, uid, whenInteractive } from "./editor-helpers";

test("the division form says a reversed compass in place and asks before keeping 5000 mm of wind", async ({ page }) => {
  test.setTimeout(60_000);
  const designer = await makeUser("designer");
  const { projectId, schemeId } = await projectWithScheme(designer, restoreScheme);
  await openAs(page, designer, schemePath(projectId, schemeId));
  await page.getByRole("button", { name: "Edit division Great" }).click();
  const dialog = page.getByRole("dialog", { name: /Great/ });
  await dialog.getByLabel("Compass from").fill("c''''");
  await dialog.getByLabel("to", { exact: true }).fill("C");
  await dialog.getByRole("button", { name: "Apply" }).click();
  // The form stays open with the one real problem, and no follow-on message about the stops.
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText("Compass runs downward (c'''' to C); give the lowest note first");
  await expect(dialog).not.toContainText(/offset bass/i);
  await expect(dialog).not.toContainText(/Too small|expected/);

  await dialog.getByLabel("Compass from").fill("C");
  await dialog.getByLabel("to", { exact: true }).fill("c''''");
  await dialog.getByLabel("Wind pressure").fill("5000");
  await expect(dialog.getByTestId("field-warning")).toContainText("far above the usual");
  await dialog.getByRole("button", { name: "Apply" }).click();
  await expect(dialog.getByTestId("division-warnings")).toContainText("Some values are unusual");
  await dialog.getByRole("button", { name: "Keep these values and apply" }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByTestId("save-state")).toHaveAttribute("data-state", "saved", { timeout: 15_000 });
});

test("archiving a project and removing a member ask first; cancelling changes nothing", async ({ page }) => {
  const designer = await makeUser("designer");
  const workshop = await makeUser("workshop");
  const { cookie, projectId } = await projectWithScheme(designer, restoreScheme);
  expect((await api(`/api/projects/${projectId}/members`, { method: "POST", cookie, body: { email: workshop.email } })).status).toBe(200);
  await openAs(page, designer, `/projects/${projectId}`);

  await page.getByRole("button", { name: "Archive project" }).click();
  const ask = page.getByTestId("confirm-dialog");
  await expect(ask).toBeVisible();
  await ask.getByRole("button", { name: "Cancel" }).click();
  await expect(ask).toBeHidden();
  expect((await api(`/api/projects/${projectId}`, { cookie })).json.project.archived).toBe(false);

  await page.getByRole("button", { name: new RegExp(`^Remove .* from the project$`) }).click();
  await expect(ask).toContainText("no longer sees this project");
  await ask.getByRole("button", { name: "Remove from the project" }).click();
  await expect(page.getByText("was removed from the project.")).toBeVisible();
  const members = (await api(`/api/projects/${projectId}`, { cookie })).json.project.members as { email: string }[];
  expect(members.map((m) => m.email)).not.toContain(workshop.email);

  await page.getByRole("button", { name: "Archive project" }).click();
  await ask.getByRole("button", { name: /^Archive/ }).click();
  await expect.poll(async () => (await api(`/api/projects/${projectId}`, { cookie })).json.project.archived).toBe(true);
});

test("the workshop opens a stop and reads its details; the estimator sets the status from a details text", async ({ page, browser }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId } = await projectWithScheme(designer, restoreScheme);
  await openAs(page, await makeUser("workshop"), schemePath(projectId, schemeId));
  await page.getByRole("button", { name: "Details of Clarabella 8′" }).first().click();
  const details = page.getByTestId("stop-details");
  await expect(details).toBeVisible();
  await expect(details).toContainText("Clarabella");
  await expect(details).toContainText(/pine/i);
  await expect(page.getByRole("dialog").getByRole("textbox")).toHaveCount(0);

  const ctx = await browser.newContext();
  const ep = await ctx.newPage();
  await openAs(ep, await makeUser("estimator"), `/projects/${projectId}`);
  await expect(ep.getByTestId("project-details-text")).toContainText("Invented parish of St Test");
  await expect(ep.getByRole("form", { name: "Project details" })).toHaveCount(0);
  await ep.getByLabel("Status", { exact: true }).selectOption("tender");
  await ep.getByRole("button", { name: "Set status" }).click();
  await expect(ep.getByText("Status set to Tender.")).toBeVisible();
  await expect(ep.getByTestId("project-status")).toHaveText("Tender");
  await ctx.close();
});

async function sideways(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

test("at 390 px no page scrolls sideways, for each role", async ({ browser }) => {
  test.setTimeout(180_000);
  const designer = await makeUser("designer");
  const { cookie, projectId, schemeId } = await projectWithScheme(designer, restoreScheme, `Phone width ${uid()}`);
  expect((await api(`/api/schemes/${schemeId}`, { method: "PATCH", cookie, body: { sharedWithClient: true } })).status).toBe(200);
  const client = await makeUser("client");
  expect((await api(`/api/projects/${projectId}/members`, { method: "POST", cookie, body: { email: client.email } })).status).toBe(200);
  const scheme = schemePath(projectId, schemeId);
  const pages: [Parameters<typeof makeUser>[0] | "the designer", string[]][] = [
    ["the designer", ["/", "/projects", `/projects/${projectId}`, scheme, `${scheme}/stop-list`, `${scheme}/chests`, `/projects/${projectId}/compare`]],
    ["admin", ["/admin/users", "/admin/firm", "/admin/mail"]],
    ["estimator", ["/", `/projects/${projectId}`, scheme, "/rates"]],
    ["workshop", ["/", `/projects/${projectId}`, scheme]],
    ["client", [`/projects/${projectId}`, scheme]],
  ];
  for (const [role, paths] of pages) {
    const user = role === "the designer" ? designer : role === "client" ? client : await makeUser(role);
    const ctx = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await ctx.newPage();
    await openAs(page, user, paths[0]!);
    for (const path of paths) {
      if (path !== paths[0]) await page.goto(path);
      await expect(page.getByTestId("user-name")).toBeAttached();
      await expect(page.getByRole("button", { name: "Sign out" }), `${role} ${path}: Sign out within reach`).toBeInViewport();
      expect(await sideways(page), `${role} ${path} scrolls sideways`).toBeLessThanOrEqual(0);
    }
    await ctx.close();
  }
});

/**
 * A project with two schemes (the project page then offers Compare beside its heading), its estimator
 * a member, and a draft quotation of the first scheme on a rate set of their own.
 */
async function pricedProject(name: string) {
  const designer = await makeUser("designer");
  const estimator = await makeUser("estimator");
  const { cookie, projectId, schemeId } = await projectWithScheme(designer, restoreScheme, name);
  await addScheme(cookie, projectId, { ...restoreScheme, name: "Second scheme" });
  expect((await api(`/api/projects/${projectId}/members`, { method: "POST", cookie, body: { email: estimator.email } })).status).toBe(200);
  const ec = await signIn(estimator);
  const set = (await api("/api/rate-sets", { method: "POST", cookie: ec, body: { name: `Rates of ${name}` } })).json.rateSet;
  const quotation = await api(`/api/projects/${projectId}/quotations`, { method: "POST", cookie: ec, body: { schemeId, rateSetId: set.id } });
  expect(quotation.status).toBe(201);
  return { designer, estimator, projectId, set, quotationId: quotation.json.quotation.id as string };
}

test("at 390 px the project page with two schemes, the quotation, survey files, import and rate-set pages fit the screen", async ({ browser }) => {
  test.setTimeout(120_000);
  const { designer, estimator, projectId, set, quotationId } = await pricedProject(`Phone pages ${uid()}`);
  const pages: [typeof designer, string[]][] = [
    [designer, [`/projects/${projectId}`, `/projects/${projectId}/files`, `/projects/${projectId}/import`]],
    [estimator, [`/projects/${projectId}/quotations/${quotationId}`, "/rates", `/rates/${set.id}`]],
  ];
  for (const [user, paths] of pages) {
    const ctx = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await ctx.newPage();
    await openAs(page, user, paths[0]!);
    for (const path of paths) {
      if (path !== paths[0]) await page.goto(path);
      await whenInteractive(page);
      await expect(page.getByRole("button", { name: "Sign out" }), `${path}: Sign out within reach`).toBeInViewport();
      expect(await sideways(page), `${path} scrolls sideways`).toBeLessThanOrEqual(0);
    }
    await ctx.close();
  }
});

/** Boxes on the page that scroll sideways inside themselves (a table cut off at the screen's edge). */
async function boxesScrollingSideways(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    [...document.querySelectorAll("main *")]
      .filter((el) => getComputedStyle(el).overflowX === "auto" && el.scrollWidth > el.clientWidth + 1)
      .map((el) => el.querySelector("[data-testid]")?.getAttribute("data-testid") ?? el.tagName),
  );
}

test("at 390 px the project list, the schemes and the quotations read as cards, with nothing cut off at the edge", async ({ browser }) => {
  test.setTimeout(120_000);
  const { designer, estimator, projectId } = await pricedProject(`Phone cards ${uid()}`);

  const ctx = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const page = await ctx.newPage();
  await openAs(page, designer, "/projects");
  await whenInteractive(page);
  const projects = page.getByTestId("projects-table");
  await expect(projects.getByRole("columnheader")).toHaveCount(1);
  const row = projects.getByTestId(/^project-Phone cards /);
  await expect(row.getByTestId("project-phone-line")).toContainText("Enquiry · 2 schemes");
  expect(await boxesScrollingSideways(page)).toEqual([]);
  // The one column cannot be sorted by its header alone: the phone's own sort menu orders by name.
  await page.getByLabel("Sort by").selectOption({ label: "Project ▲" });
  const names = await projects.locator("tbody tr td:first-child a").allTextContents();
  expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b, "en-GB", { sensitivity: "base" })));

  await page.goto(`/projects/${projectId}`);
  await whenInteractive(page);
  const scheme = page.getByTestId("scheme-Second scheme");
  await expect(scheme.getByLabel("Status of Second scheme")).toBeInViewport({ ratio: 1 });
  await expect(scheme).toContainText("Stops");
  expect(await boxesScrollingSideways(page)).toEqual([]);
  await ctx.close();

  // The estimator's view of the same page lists the quotation, its total and date under labels.
  const ectx = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const epage = await ectx.newPage();
  await openAs(epage, estimator, `/projects/${projectId}`);
  await whenInteractive(epage);
  const quotations = epage.getByTestId("quotations-table");
  await expect(quotations.locator("tbody").getByText("Valid until")).toBeVisible();
  await expect(quotations.getByRole("columnheader", { name: "Valid until" })).toBeHidden();
  const total = (await quotations.getByTestId("quotation-total").boundingBox())!;
  expect(total.x + total.width, "the quotation's total ends within the screen's width").toBeLessThanOrEqual(390);
  expect(await boxesScrollingSideways(epage)).toEqual([]);
  await ectx.close();
});
