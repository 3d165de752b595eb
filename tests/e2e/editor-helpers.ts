// Page helpers for the specification editor's e2e tests: data made through the API, and the
// editor's forms, save state and keyboard moves driven the way a designer does.
import { randomUUID } from "node:crypto";
import { expect, type Locator, type Page } from "@playwright/test";
import type { SchemeDocumentInput } from "@/lib/spec/document";
import { api, baseUrl, signIn, type TestUser } from "../support/server";

export const uid = () => randomUUID().slice(0, 8);

/**
 * Opens a page as a user, signed in the way a browser is (csrf, then credentials) but without the
 * sign-in form, which tests/e2e/auth.e2e.ts covers: the session cookies go into the page's context.
 */
export async function openAs(page: Page, user: Pick<TestUser, "email" | "password">, path: string) {
  const header = await signIn(user);
  const cookies = header.split("; ").map((pair) => {
    const i = pair.indexOf("=");
    return { name: pair.slice(0, i), value: pair.slice(i + 1), url: baseUrl };
  });
  await page.context().addCookies(cookies);
  await page.goto(path);
  await expect(page.getByTestId("user-name")).toBeVisible();
  await whenInteractive(page);
}

/**
 * Waits until React has hydrated the page (its handlers are on the elements), so a click is not
 * lost on server-rendered markup.
 */
export async function whenInteractive(page: Page) {
  // The layout (with Sign out) hydrates before a page that streams in behind its loading skeleton:
  // wait for the skeleton to go and for the page itself to be hydrated too.
  await expect
    .poll(
      () =>
        page.evaluate(() => {
          const hydrated = (el: Element) => Object.keys(el).some((k) => k.startsWith("__reactProps"));
          const signOut = [...document.querySelectorAll("button")].find((b) => b.textContent?.trim() === "Sign out");
          if (!signOut || !hydrated(signOut) || document.querySelector('[data-testid="page-loading"]')) return false;
          const first = document.querySelector("main > *");
          return !first || hydrated(first);
        }),
      { message: "the page is hydrated" },
    )
    .toBe(true);
}

/** A project and one scheme made through the API by a designer; answers their ids and the designer's cookie. */
export async function projectWithScheme(designer: TestUser, document: SchemeDocumentInput, projectName = `Editor test ${uid()}`) {
  const cookie = await signIn(designer);
  const project = await api("/api/projects", { method: "POST", cookie, body: { name: projectName, clientName: "Invented parish of St Test" } });
  expect(project.status).toBe(201);
  const projectId = project.json.project.id as string;
  const scheme = await addScheme(cookie, projectId, document);
  return { cookie, projectId, schemeId: scheme.id as string, scheme };
}

export async function addScheme(cookie: string, projectId: string, document: SchemeDocumentInput) {
  const res = await api(`/api/projects/${projectId}/schemes`, { method: "POST", cookie, body: { name: document.name, document } });
  expect(res.status).toBe(201);
  return res.json.scheme;
}

export const schemePath = (projectId: string, schemeId: string) => `/projects/${projectId}/schemes/${schemeId}`;

/** The editor's save badge. */
export const saveState = (page: Page) => page.getByTestId("save-state");

/** Waits for the debounced save to land (never a fixed sleep), optionally at a given version. */
export async function expectSaved(page: Page, version?: number) {
  await expect(saveState(page)).toHaveAttribute("data-state", "saved", { timeout: 15_000 });
  if (version !== undefined) await expect(saveState(page)).toHaveText(new RegExp(`v${version}$`));
}

/** The version the badge shows once saved ("Saved v4" → 4). */
export async function savedVersion(page: Page): Promise<number> {
  await expectSaved(page);
  const m = /v(\d+)/.exec((await saveState(page).textContent()) ?? "");
  expect(m, "the save badge shows a version").not.toBeNull();
  return Number(m![1]);
}

export type DivisionFields = { name: string; keyboard?: "manual" | "pedal"; space?: { lengthMm: number; depthMm: number } };

/** Adds a division through its form (the first through "Add the first division"). */
export async function addDivision(page: Page, fields: DivisionFields) {
  const first = page.getByRole("button", { name: "Add the first division" });
  if (await first.isVisible()) await first.click();
  else await page.getByRole("button", { name: "+ Add division" }).click();
  const dialog = page.getByRole("dialog", { name: "New division" });
  await expect(dialog).toBeVisible();
  await dialog.getByLabel("Name", { exact: true }).fill(fields.name);
  if (fields.keyboard) await dialog.getByLabel("Played from").selectOption(fields.keyboard);
  if (fields.space) await fillSpace(dialog, fields.space);
  await dialog.getByRole("button", { name: "Add division" }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByTestId(`division-${fields.name}`)).toBeVisible();
}

export async function fillSpace(dialog: Locator, space: { lengthMm: number; depthMm: number }) {
  const known = dialog.getByLabel("Space in the case is known");
  if (!(await known.isChecked())) await known.check();
  await dialog.getByLabel("Space for the chest, length (mm)").fill(String(space.lengthMm));
  await dialog.getByLabel("depth (mm)").fill(String(space.depthMm));
}

export type StopFields = { preset?: string; name?: string; footage?: string; family?: string };

/** Adds a stop to a division through the stop form: from a preset (by its label, e.g. "Trumpet 8′"), typed fields, or both. */
export async function addStop(page: Page, division: string, fields: StopFields) {
  await page.getByRole("button", { name: `Add a stop to the ${division}` }).click();
  const dialog = page.getByRole("dialog", { name: `New stop — ${division}` });
  await expect(dialog).toBeVisible();
  if (fields.preset) await dialog.getByLabel("Start from a common stop").selectOption({ label: fields.preset });
  if (fields.name) await dialog.getByLabel("Name", { exact: true }).fill(fields.name);
  if (fields.footage) await dialog.getByLabel("Pitch (ft)").fill(fields.footage);
  if (fields.family) await dialog.getByLabel("Family").selectOption(fields.family);
  await dialog.getByRole("button", { name: "Add stop" }).click();
  await expect(dialog).toBeHidden();
}

/** Opens a stop's edit form by the card's button ("Edit Principal 4′") and renames it. */
export async function renameStop(page: Page, current: string, pitch: string, next: string) {
  await page.getByRole("button", { name: `Edit ${current} ${pitch}` }).click();
  const dialog = page.getByRole("dialog", { name: new RegExp(`^${current} `) });
  await expect(dialog).toBeVisible();
  await dialog.getByLabel("Name", { exact: true }).fill(next);
  await dialog.getByRole("button", { name: "Apply" }).click();
  await expect(dialog).toBeHidden();
}

/**
 * Carries a stop with dnd-kit's keyboard sensor: Space picks it up, the arrow keys carry it, Space
 * drops it. The sensor measures between steps, so each key waits a moment for it.
 */
export async function keyboardMove(page: Page, handleLabel: string, keys: string[]) {
  const handle = page.getByRole("button", { name: handleLabel, exact: true });
  await handle.focus();
  await page.keyboard.press("Space");
  await page.waitForTimeout(150);
  for (const key of keys) {
    await page.keyboard.press(key);
    await page.waitForTimeout(150);
  }
  await page.keyboard.press("Space");
}

/** A stop's card on the board. */
export const stopCard = (page: Page, name: string) => page.getByTestId(`stop-${name}`);
