import { expect, test } from "@playwright/test";
import { roles } from "@/lib/roles";
import { closeTestDb, makeUser } from "../support/server";
import { signInAs } from "./helpers";

test.afterAll(closeTestDb);

for (const role of roles) {
  test(`a ${role} signs in and sees their home`, async ({ page }) => {
    const user = await makeUser(role);
    await signInAs(page, user);
    await expect(page.getByTestId(`home-${role}`)).toBeVisible();
    await expect(page.getByTestId("user-role")).not.toBeEmpty();
    // Only an admin is offered the users page.
    await expect(page.getByRole("link", { name: "Users", exact: true })).toHaveCount(role === "admin" ? 1 : 0);
    // A new committee member belongs to no project yet, and is told so.
    if (role === "client") await expect(page.getByText("Nothing has been shared with you yet.")).toBeVisible();
  });
}

test("a signed-out visit to a signed-in page lands on sign-in, then returns there", async ({ page }) => {
  await page.goto("/admin/users");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);
  const admin = await makeUser("admin");
  await page.getByLabel("E-mail").fill(admin.email);
  await page.getByLabel("Password").fill(admin.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/admin\/users$/);
  await expect(page.getByTestId("users-table")).toBeVisible();
});

test("a wrong password shows the error and stays signed out", async ({ page }) => {
  const user = await makeUser("designer");
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(user.email);
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("sign-in-error")).toHaveText(/do not match an account/);
  await page.goto("/");
  await expect(page).toHaveURL(/\/sign-in/);
});

test("a disabled account is told so", async ({ page }) => {
  const user = await makeUser("estimator", { disabled: true });
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(user.email);
  await page.getByLabel("Password").fill(user.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("sign-in-error")).toHaveText(/disabled/);
});

test("sign-out ends the session", async ({ page }) => {
  await signInAs(page, await makeUser("workshop"));
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await page.goto("/");
  await expect(page).toHaveURL(/\/sign-in/);
});

test("a non-admin sent to the users page sees the refusal, not the list", async ({ page }) => {
  await signInAs(page, await makeUser("designer"));
  await page.goto("/admin/users");
  await expect(page.getByRole("heading", { name: "Not open to your role" })).toBeVisible();
  await expect(page.getByTestId("users-table")).toHaveCount(0);
});

test("an admin adds a user, sees a duplicate refused in place, and disables the new user", async ({ page }) => {
  await signInAs(page, await makeUser("admin"), "/admin/users");
  const email = `added-${Date.now()}@test.example`;
  const form = page.getByRole("form", { name: "Add a user" });
  await form.getByLabel("Name").fill("Added Person");
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Role").selectOption("workshop");
  await form.getByLabel("First password").fill("a-long-password");
  await form.getByRole("button", { name: "Add user" }).click();
  await expect(form.getByRole("status")).toHaveText(/can now sign in/);
  const row = page.getByTestId(`user-${email}`);
  await expect(row).toContainText("Added Person");

  await form.getByLabel("Name").fill("Twice");
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("First password").fill("a-long-password");
  await form.getByRole("button", { name: "Add user" }).click();
  // Said once, beside the e-mail field, and gone once the address is changed.
  const duplicate = form.getByText(`A user with the e-mail ${email} already exists.`);
  await expect(duplicate).toHaveCount(1);
  await form.getByLabel("E-mail").fill(`other-${email}`);
  await expect(duplicate).toHaveCount(0);
  await expect(form.getByRole("status")).toHaveCount(0);

  // Disabling and a change of role ask first, and say when they are done.
  const ask = page.getByTestId("confirm-dialog");
  await row.getByRole("button", { name: "Disable" }).click();
  await expect(ask).toContainText("signed out at once");
  await ask.getByRole("button", { name: "Disable the account" }).click();
  await expect(row).toContainText("Disabled");
  await expect(page.getByTestId("users-status")).toContainText("Added Person is disabled and signed out.");
  await row.getByLabel(/Role of/).selectOption("estimator");
  await ask.getByRole("button", { name: "Make Estimator" }).click();
  await expect(page.getByTestId("users-status")).toContainText("Added Person is now an Estimator.");
  await page.reload();
  await expect(page.getByTestId(`user-${email}`).getByLabel(/Role of/)).toHaveValue("estimator");
});
