import { chromium } from "@playwright/test";
const base = "http://127.0.0.1:3421";
const [email, password, ...paths] = process.argv.slice(2);
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"] });
for (const width of [1440, 390]) {
  const ctx = await browser.newContext({ viewport: { width, height: 900 } });
  const page = await ctx.newPage();
  page.on("pageerror", (e) => console.log("pageerror", e.message));
  page.on("console", (m) => { if (m.type() === "error") console.log("console", m.text()); });
  await page.goto(`${base}/sign-in`);
  await page.getByLabel("E-mail").fill(email!);
  await page.getByLabel("Password").fill(password!);
  await page.getByRole("button", { name: /sign in/i }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
  for (const [i, p] of paths.entries()) {
    let path = p;
    if (p.startsWith("@")) { // @text : click link with text from projects
      await page.goto(`${base}/projects`);
      await page.getByRole("link", { name: p.slice(1) }).first().click();
      await page.waitForLoadState("networkidle");
    } else {
      await page.goto(`${base}${path}`);
      await page.waitForLoadState("networkidle");
    }
    const name = `/tmp/wt10-shots/${email!.split("@")[0]}-${i}-${width}.png`;
    await page.screenshot({ path: name, fullPage: true });
    console.log(name, page.url());
  }
  await ctx.close();
}
await browser.close();
