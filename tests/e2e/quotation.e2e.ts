import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import mammoth from "mammoth";
import { smallDocument } from "../support/fixtures";
import { waitForMail } from "../support/mail";
import { api, closeTestDb, makeUser, signIn, testDb } from "../support/server";
import { openAs, projectWithScheme, uid } from "./editor-helpers";

test.describe.configure({ timeout: 120_000 });
test.afterAll(closeTestDb);

test("an estimator edits a rate, prices a scheme, adds a lump sum and an option, issues the quotation and downloads the tender", async ({ page }) => {
  const designer = await makeUser("designer");
  const estimator = await makeUser("estimator");
  const { projectId, schemeId } = await projectWithScheme(designer, smallDocument("Scheme A"), `Quotation test ${uid()}`);

  // A rate set of the test's own, with one rate changed in the editor.
  await openAs(page, estimator, "/rates");
  const setName = `Browser rates ${uid()}`;
  const newSet = page.getByRole("form", { name: "New rate set" });
  await newSet.getByLabel("Name").fill(setName);
  await newSet.getByRole("button", { name: "Make the set" }).click();
  await expect(page.getByTestId("rate-set-name")).toHaveText(setName);
  const voicing = page.getByLabel("Hourly rates by department — Voicing");
  // A bad value is named in place, in the estimator's words, and nothing is saved.
  await voicing.fill("lots");
  await page.getByRole("button", { name: "Save as version 2" }).click();
  await expect(page.getByText(/Voicing "lots" is not an amount/)).toBeVisible();
  await expect(page.getByTestId("rate-set-version")).toHaveText("1");
  await voicing.fill("79.50");
  await page.getByLabel("What changed (kept with the version)").fill("voicing rate up");
  await page.getByRole("button", { name: "Save as version 2" }).click();
  await expect(page.getByTestId("rate-set-version")).toHaveText("2");
  await expect(page.getByTestId("rates-notice")).toContainText("Saved as version 2");

  // Price the scheme with that set.
  await page.goto(`/projects/${projectId}`);
  const form = page.getByRole("form", { name: "Price a scheme" });
  await form.getByLabel("with the rate set").selectOption({ label: setName });
  await form.getByRole("button", { name: "New quotation" }).click();
  await expect(page).toHaveURL(/\/quotations\/[0-9a-f-]{36}$/);
  await expect(page.getByTestId("quote-status")).toHaveAttribute("data-status", "draft");
  const number = (await page.getByTestId("quote-number").textContent())!.trim();
  expect(number).toMatch(/^Q-\d{4}-\d{4,}$/);
  const totalBefore = await page.getByTestId("quote-total").textContent();

  // A lump sum and an option; the total follows the lump sum as it is typed, and not the option.
  await page.getByRole("button", { name: "Add a lump sum" }).click();
  await page.locator("#lump-0-category").selectOption("scaffolding");
  await page.locator("#lump-0-description").fill("Scaffold tower to the gallery");
  await page.locator("#lump-0-quantity").fill("3");
  await page.locator("#lump-0-unit").fill("week");
  await page.locator("#lump-0-price").fill("-100");
  await expect(page.getByText("Unit price cannot be negative.")).toBeVisible();
  await page.locator("#lump-0-price").fill("410.00");
  await expect(page.getByTestId("quote-total")).not.toHaveText(totalBefore!);
  const withLump = await page.getByTestId("quote-total").textContent();
  await page.getByRole("button", { name: "Add an option" }).click();
  await page.locator("#opt-0-title").fill("Cymbelstern");
  await page.locator("#opt-0-price").fill("4200.00");
  await expect(page.getByTestId("quote-total")).toHaveText(withLump!);
  await page.locator("#q-start").fill("2028-09-04");
  await page.getByRole("button", { name: "Save the terms" }).click();
  await expect(page.getByTestId("quote-notice")).toHaveText(/Saved\./);

  // Issue it: it is frozen.
  page.once("dialog", (d) => void d.accept());
  await page.getByRole("button", { name: "Issue the quotation" }).click();
  await expect(page.getByTestId("quote-status")).toHaveAttribute("data-status", "issued");
  await expect(page.getByTestId("quote-notice")).toContainText("is frozen");
  await expect(page.locator("#lump-0-description")).toBeDisabled();
  const { rows } = await testDb().query("select status, snapshot is not null as frozen from quotations where number = $1", [number]);
  expect(rows[0]).toEqual({ status: "issued", frozen: true });

  // Download the tender.
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("download-tender").click()]);
  expect(download.suggestedFilename()).toBe(`tender-${number}.docx`);
  const text = (await mammoth.extractRawText({ path: (await download.path())! })).value;
  expect(text).toContain(number);
  expect(text).toContain("Scaffold tower to the gallery");
  expect(text).toContain("Cymbelstern");
  expect(readFileSync((await download.path())!).subarray(0, 2).toString()).toBe("PK");

  // Send it to the committee: each member gets the tender by e-mail, and finds it and its price in the project.
  const member = await makeUser("client");
  const dc = await signIn(designer);
  await api(`/api/projects/${projectId}/members`, { method: "POST", cookie: dc, body: { email: member.email } });
  await api(`/api/schemes/${schemeId}`, { method: "PATCH", cookie: dc, body: { sharedWithClient: true } });
  page.once("dialog", (d) => void d.accept());
  await page.getByRole("button", { name: "Send the tender to the committee" }).click();
  await expect(page.getByTestId("quote-notice")).toContainText("went to 1 committee member");
  await expect(page.getByTestId("tender-sent")).toBeVisible();
  const total = (await page.getByTestId("quote-total").textContent())!.trim();
  const mail = await waitForMail((m) => m.envelopeTo.includes(member.email) && m.subject.includes(number));
  expect(mail.attachments.map((a) => a.filename)).toEqual([`tender-${number}.docx`]);
  expect((await mammoth.extractRawText({ buffer: mail.attachments[0]!.content })).value).toContain("Cymbelstern");

  await page.context().clearCookies();
  await openAs(page, member, `/projects/${projectId}`);
  const row = page.getByTestId(`quotation-${number}`);
  await expect(row.getByTestId("quotation-total")).toHaveText(total);
  await expect(row.getByRole("link", { name: "Tender (.docx)" })).toBeVisible();
  await page.getByRole("link", { name: "Scheme A" }).first().click();
  await expect(page.getByTestId("tender-price")).toContainText(number);
});

test("the workshop finds the work list of an issued quotation, without prices", async ({ page }) => {
  const designer = await makeUser("designer");
  const workshop = await makeUser("workshop");
  const { projectId } = await projectWithScheme(designer, smallDocument("Scheme W"), `Work list test ${uid()}`);
  const admin = await makeUser("admin");
  await openAs(page, admin, `/projects/${projectId}`);
  await page.getByRole("form", { name: "Price a scheme" }).getByRole("button", { name: "New quotation" }).click();
  await expect(page.getByTestId("quote-status")).toHaveAttribute("data-status", "draft");
  page.once("dialog", (d) => void d.accept());
  await page.getByRole("button", { name: "Issue the quotation" }).click();
  await expect(page.getByTestId("quote-status")).toHaveAttribute("data-status", "issued");
  const number = (await page.getByTestId("quote-number").textContent())!.trim();

  await page.context().clearCookies();
  await openAs(page, workshop, `/projects/${projectId}`);
  const row = page.getByTestId(`quotation-${number}`);
  await expect(row).toBeVisible();
  await expect(row.getByRole("link", { name: "Tender (.docx)" })).toHaveCount(0);
  const [download] = await Promise.all([page.waitForEvent("download"), row.getByRole("link", { name: "Work list (.docx)" }).click()]);
  const text = (await mammoth.extractRawText({ path: (await download.path())! })).value;
  expect(text).toContain("Work list");
  expect(text).not.toMatch(/€|EUR/);
});
