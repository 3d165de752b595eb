import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import sharp from "sharp";
import { smallDocument } from "../support/fixtures";
import { closeTestDb, makeUser } from "../support/server";
import { openAs, projectWithScheme, schemePath, stopCard, uid, whenInteractive } from "./editor-helpers";

test.describe.configure({ timeout: 90_000 });
test.afterAll(closeTestDb);

/** A photo-sized picture of noise: about 2 MB as JPEG, so a throttled upload shows its progress. */
async function noisyPhoto(): Promise<Buffer> {
  const w = 1400;
  const h = 1050;
  const raw = Buffer.alloc(w * h * 3);
  for (let i = 0; i < raw.length; i++) raw[i] = (i * 2654435761) >>> 24;
  return sharp(raw, { raw: { width: w, height: h, channels: 3 } }).jpeg({ quality: 95 }).toBuffer();
}

test("a designer uploads a photo with a progress bar, links it to a stop, and finds it in the gallery and in the stop's form", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId } = await projectWithScheme(designer, smallDocument("Scheme A"), `Survey e2e ${uid()}`);
  await openAs(page, designer, `/projects/${projectId}/files`);

  const upload = page.getByRole("region", { name: "Add a survey file" });
  await upload.getByLabel("Photo, drawing or document").setInputFiles({ name: "diapason-mouths.jpg", mimeType: "image/jpeg", buffer: await noisyPhoto() });
  await upload.getByLabel("Caption").fill("Open Diapason mouths: nicking worn at the bass");
  await upload.getByLabel("Shows").selectOption({ label: "\u2003Great: Open Diapason 8′" });

  // About 1 MB/s up, so the bytes take a couple of seconds to reach the store and the bar moves.
  const cdp = await page.context().newCDPSession(page);
  await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: 1_000_000 });
  await upload.getByRole("button", { name: "Upload" }).click();
  const bar = upload.getByRole("progressbar", { name: "Upload" });
  await expect(bar).toBeVisible();
  await expect.poll(async () => Number(await bar.getAttribute("aria-valuenow")), { intervals: [50], timeout: 10_000 }).toBeGreaterThan(0);
  await expect(upload.getByRole("status")).toHaveText("✓ Kept “diapason-mouths.jpg”, linked to Scheme A · Open Diapason.", { timeout: 20_000 });
  await expect(bar).toBeHidden();
  await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });

  // In the gallery, with its thumbnail loaded through the app's checked link.
  const card = page.getByTestId("file-diapason-mouths.jpg");
  await expect(card).toContainText("Open Diapason mouths: nicking worn at the bass");
  await expect(card).toContainText("Scheme A · Open Diapason");
  const thumb = card.getByRole("img");
  await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(480);

  // From the stop's form in the editor.
  await page.goto(schemePath(projectId, schemeId));
  await whenInteractive(page);
  await expect(stopCard(page, "Open Diapason")).toBeVisible();
  await page.getByRole("button", { name: "Edit Open Diapason 8′" }).click();
  const dialog = page.getByRole("dialog", { name: /^Open Diapason / });
  const files = dialog.getByTestId("stop-files");
  await expect(files).toContainText("Open Diapason mouths: nicking worn at the bass");
  await expect.poll(() => files.getByRole("img").evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBeGreaterThan(0);
  // Another stop has none.
  await dialog.getByRole("button", { name: "Cancel" }).click();
  await page.getByRole("button", { name: "Edit Principal 4′" }).click();
  await expect(page.getByRole("dialog", { name: /^Principal / }).getByTestId("stop-files")).toContainText("None linked yet.");
});

test("a designer exports a scheme's stop list as CSV and imports it again as a new scheme", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId, schemeId } = await projectWithScheme(designer, smallDocument("Scheme A"), `Import e2e ${uid()}`);
  await openAs(page, designer, `${schemePath(projectId, schemeId)}/stop-list`);

  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download CSV" }).click()]);
  expect(download.suggestedFilename()).toBe("Scheme-A.csv");
  const path = await download.path();
  const csv = readFileSync(path, "utf8");
  expect(csv.split("\r\n")[1]).toMatch(/^Great,Open Diapason,8,1,principal,new,,spotted,open,/); // origin new, no work on existing pipes

  await page.goto(`/projects/${projectId}`);
  await whenInteractive(page);
  await page.getByRole("link", { name: "Import a stop list" }).click();
  await expect(page.getByRole("heading", { name: "Import a stop list" })).toBeVisible();
  await whenInteractive(page);
  await page.getByLabel("Name of the new scheme").fill("Scheme A from the spreadsheet");
  // As the browser saved it, under the name the server gave it.
  await page.getByLabel("File").setInputFiles({ name: download.suggestedFilename(), mimeType: "text/csv", buffer: readFileSync(path) });
  const preview = page.getByTestId("import-preview");
  await expect(preview).toContainText("with 2 divisions and 6 stops");
  await expect(preview).toContainText("Twelfth");
  await expect(preview).toContainText("2⅔′");
  await page.getByRole("button", { name: "Import as a new scheme" }).click();

  await expect(page).toHaveURL(new RegExp(`/projects/${projectId}/schemes/(?!${schemeId})[0-9a-f-]{36}$`));
  await expect(page.getByTestId("scheme-name")).toHaveText("Scheme A from the spreadsheet");
  for (const name of ["Open Diapason", "Principal", "Twelfth", "Fifteenth", "Bourdon", "Bass Flute"]) await expect(stopCard(page, name)).toBeVisible();
});

test("an import of a CSV with bad rows shows every problem by row and offers no import", async ({ page }) => {
  const designer = await makeUser("designer");
  const { projectId } = await projectWithScheme(designer, smallDocument("Scheme A"), `Import e2e ${uid()}`);
  await openAs(page, designer, `/projects/${projectId}/import`);
  const text = "division,name,pitch,family\nGreat,Open Diapason,8′,principal\nGreat,Twelfth,2.67,mutation\nPedal,Bourdon,16',wood\n";
  await page.getByLabel("File").setInputFiles({ name: "by-hand.csv", mimeType: "text/csv", buffer: Buffer.from(text) });
  const problems = page.getByTestId("import-problems");
  await expect(problems).toContainText("2 problems — nothing will be imported");
  await expect(problems.getByRole("listitem")).toHaveText([/^Row 3, pitch: "2\.67" is not a footage/, /^Row 4, family: "wood" is not one of/]);
  await expect(page.getByRole("button", { name: "Import as a new scheme" })).toHaveCount(0);
});
