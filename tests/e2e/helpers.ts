import { expect, type Page } from "@playwright/test";
import type { TestUser } from "../support/server";

export async function signInAs(page: Page, user: Pick<TestUser, "email" | "password">, path = "/") {
  await page.goto(path);
  await page.getByLabel("E-mail").fill(user.email);
  await page.getByLabel("Password").fill(user.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("user-name")).toBeVisible();
}
