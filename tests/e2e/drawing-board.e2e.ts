import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import Papa from "papaparse";
import { smallDocument } from "../support/fixtures";
import { api, closeTestDb, makeUser, signIn } from "../support/server";
import { expectSaved, openAs, projectWithScheme, schemePath, uid } from "./editor-helpers";
import { diameterMm } from "@/lib/estimate/scale";

test.describe.configure({ timeout: 90_000 });
test.afterAll(closeTestDb);

test("a tonal director reads a stop's pipe table, switches to inches and downloads it as CSV", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId } = await projectWithScheme(designer, smallDocument("Scheme P"), `Pipes e2e ${uid()}`);
  await openAs(page, designer, `${schemePath(projectId, schemeId)}/pipes?stop=gt-pr`);

  const table = page.getByTestId("pipe-table");
  await expect(table.getByRole("heading", { name: "Great: Principal" })).toBeVisible();
  // 61 new pipes of a 4′ Principal; its C is 4′ C of the normal scale, 92.5 mm (Adelung via Wikipedia: 92.4 rounded).
  await expect(page.getByTestId("pipe-totals")).toContainText("61 pipes listed — 61 new");
  const firstRow = table.locator("tbody tr").first();
  await expect(firstRow.locator("td").nth(0)).toHaveText("C");
  await expect(firstRow.locator("td").nth(4)).toHaveText(/^92\.[45]$/);
  await expect(table.locator("tbody tr")).toHaveCount(61);

  const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("pipe-csv").click()]);
  expect(download.suggestedFilename()).toBe("Scheme-P-Great-Principal-pipes.csv");
  const csv = readFileSync((await download.path())!, "utf8");
  const rows = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: true }).data;
  expect(rows.length).toBe(61);
  expect(Number(rows[0]["Diameter (mm)"])).toBeCloseTo(92.46, 1);
  expect(rows[60]["Key"]).toBe("c''''");

  // Inches: the page and its CSV follow (92.46 mm = 3.64 in).
  await page.getByRole("link", { name: "inches, lb" }).click();
  await page.waitForURL(/units=in/);
  await expect(firstRow.locator("td").nth(4)).toHaveText("3.64", { timeout: 15_000 });
  const [inches] = await Promise.all([page.waitForEvent("download"), page.getByTestId("pipe-csv").click()]);
  const inRows = Papa.parse<Record<string, string>>(readFileSync((await inches.path())!, "utf8").replace(/^\uFEFF/, ""), { header: true }).data;
  expect(Number(inRows[0]["Diameter (in)"])).toBeCloseTo(3.64, 2);
});

test("the pipe CSV checks who asks: a committee member and a stranger's stop get no pipes", async () => {
  const designer = await makeUser("designer");
  const client = await makeUser("client");
  const { schemeId } = await projectWithScheme(designer, smallDocument("Scheme Q"), `Pipes access ${uid()}`);
  const clientCookie = await signIn(client);
  const refused = await api(`/api/schemes/${schemeId}/pipes?stop=gt-od`, { cookie: clientCookie });
  expect(refused.status).toBe(403);
  const none = await api(`/api/schemes/${schemeId}/pipes?stop=gt-od`);
  expect(none.status).toBe(401);
  const designerCookie = await signIn(designer);
  const missing = await api(`/api/schemes/${schemeId}/pipes?stop=no-such-stop`, { cookie: designerCookie });
  expect(missing.status).toBe(404);
  expect(missing.json.error.message).toMatch(/no such stop/);
  const all = await api(`/api/schemes/${schemeId}/pipes?stop=all&units=in`, { cookie: designerCookie });
  expect(all.status).toBe(200);
});

test("a tonal director narrows a rank on the scaling chart, fits a scale from survey measurements and accepts it", async ({ page }) => {
  const designer = await makeUser("designer");
  const doc = smallDocument("Scheme S");
  // A Great chest that just holds the normal-scale stops, so a wider Open Diapason shows in the chest figures.
  const { projectId, schemeId } = await projectWithScheme(designer, doc, `Scales e2e ${uid()}`);
  await openAs(page, designer, schemePath(projectId, schemeId));
  await page.getByRole("tab", { name: "Scales" }).click();
  await expect(page.getByTestId("scaling-chart-gt")).toBeVisible();

  const chest = page.getByTestId("figures-chest-Great");
  const before = await chest.textContent();
  const form = page.getByRole("form", { name: "Scale of Open Diapason" });
  await form.getByLabel("Deviation (semitones)").fill("4");
  await form.getByRole("button", { name: "Apply scale" }).click();
  await expect(chest).not.toHaveText(before!);
  await expect(page.getByTestId("scaling-chart-gt").getByText(/\+4 ht, halving on 17/)).toBeVisible();
  await expectSaved(page, 2);

  // A bad value is named in the product's words and changes nothing.
  await form.getByLabel("Halving on note").fill("7.5");
  await form.getByRole("button", { name: "Apply scale" }).click();
  await expect(form.getByText("The halving note is a whole note from 8 to 32")).toBeVisible();

  // The survey: pipes of a rank 1.5 semitones narrow, halving on the 18th note (sizes from the scale itself).
  const fit = page.getByRole("region", { name: "Fit a scale from survey measurements: Open Diapason" });
  const notes = ["C", "c", "c'", "c''", "c'''"];
  for (const [i, x] of [0, 12, 24, 36, 48].entries()) {
    await expect(fit.getByLabel(`Note, row ${i + 1}`)).toHaveValue(notes[i]);
    await fit.getByLabel(`Diameter, row ${i + 1}`).fill(diameterMm(x, { deviationHt: -1.5, halvingOn: 18, referenceSemitones: 0 }).toFixed(1));
  }
  await fit.getByRole("button", { name: "Fit scale" }).click();
  const result = page.getByTestId("fit-result");
  await expect(result).toContainText("Best match: −1.5 semitones at C, halving on note 18");
  await expect(result.getByTestId("measured-point")).toHaveCount(5);
  await result.getByRole("button", { name: "Use the fitted scale" }).click();
  await expect(page.getByTestId("scaling-chart-gt").getByText(/−1\.5 ht, halving on 18/)).toBeVisible();
  await expectSaved(page, 3);

  // Saved like any edit: the stored scheme carries the fitted scale.
  const stored = await api(`/api/schemes/${schemeId}`, { cookie: await signIn(designer) });
  const od = stored.json.scheme.document.divisions[0].stops.find((s: { id: string }) => s.id === "gt-od");
  expect(od.scale).toMatchObject({ deviationHt: -1.5, halvingOn: 18 });

  // And undone like any edit.
  await page.getByRole("button", { name: /Undo/ }).click();
  await expect(page.getByTestId("scaling-chart-gt").getByText(/\+4 ht, halving on 17/)).toBeVisible();
});

test("a tonal director opens a rank's pipe table from the chart, and sees in plan and elevation why the Great does not fit", async ({ page }) => {
  const designer = await makeUser("designer");
  const doc = smallDocument("Scheme E");
  // Room in plan for the normal scales, but only 2 m clear above the chest: the 8′ basses stand taller.
  doc.divisions![0]!.space = { lengthMm: 9000, depthMm: 900, heightMm: 2000 };
  const { projectId, schemeId } = await projectWithScheme(designer, doc, `Chests e2e ${uid()}`);
  await openAs(page, designer, schemePath(projectId, schemeId));
  await page.getByRole("tab", { name: "Scales" }).click();
  await expect(page.getByTestId("scaling-chart-gt")).toBeVisible();
  await expect(page.getByTestId("scales-chest-words")).toHaveAttribute("data-fits", "fit");

  // The chart's legend opens the rank's pipe table.
  await page.getByRole("link", { name: "Pipe table of Principal 4′" }).click();
  await page.waitForURL(/\/pipes\?stop=gt-pr/);
  await expect(page.getByTestId("pipe-table").getByRole("heading", { name: "Great: Principal" })).toBeVisible();
  await page.goBack();
  await page.getByRole("tab", { name: "Scales" }).click();

  // A much wider Open Diapason: the chest words above the chart turn, and the figures follow.
  const words = page.getByTestId("scales-chest-words");
  const before = await page.getByTestId("figures-chest-Great").textContent();
  const form = page.getByRole("form", { name: "Scale of Open Diapason" });
  await form.getByLabel("Deviation (semitones)").fill("12");
  await form.getByRole("button", { name: "Apply scale" }).click();
  await expect(words).toHaveAttribute("data-fits", "clash");
  await expect(words).toContainText(/does not fit by [\d\u202f]+ mm in depth/);
  await expect(page.getByTestId("figures-chest-Great")).not.toHaveText(before!);
  await expectSaved(page, 2);

  // In plan the space turns; in elevation the Open Diapason's basses are named as too tall, the Principal's not.
  await page.getByRole("tab", { name: "Chests" }).click();
  await expect(page.getByTestId("chest-space-Great")).toHaveAttribute("data-fits", "no");
  await expect(page.getByTestId("chest-height-Great")).toHaveAttribute("data-fits", "no");
  const tall = page.getByTestId("chest-height-words-Great");
  await expect(tall).toContainText("need mitring or another place");
  await expect(tall).toContainText(/Open Diapason 8′: C to \S+ \(\d+ pipes\)/);
  await expect(tall).not.toContainText("Principal 4′");
  await expect(page.getByTestId("chest-elevation-Great").locator("[data-too-tall]").first()).toBeVisible();
  // Beside the chest: the weight standing on it and its ranks' wind, with their cautions.
  await expect(page.getByTestId("chest-loads-Great")).toContainText("Main chest");
  await expect(page.getByTestId("chest-Great").getByText(/structural engineer/)).toBeVisible();
  await expect(page.getByTestId("chest-wind-Great")).toContainText("Open Diapason 8′");
  await expect(page.getByTestId("chest-Great").getByText(/first estimate for sizing the blower/)).toBeVisible();
  // The Pedal has no height given, and says so.
  await expect(page.getByTestId("chest-height-words-Pedal")).toContainText("not yet given");
});
