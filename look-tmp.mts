// top-level await needs ESM
import { chromium } from "playwright-core";
const APP = "http://127.0.0.1:3000";
async function main() {
const [email, ...refs] = process.argv.slice(2);
const b = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--headless", "--no-sandbox", "--disable-gpu"], headless: true });
const page = await (await b.newContext({ viewport: { width: 1440, height: 1000 } })).newPage();
await page.goto(`${APP}/sign-in`);
await page.getByLabel("E-mail").fill(email);
await page.getByLabel("Password").fill("wickmark-demo");
await page.getByRole("button", { name: "Sign in" }).click();
await page.waitForURL(/overview|portal/);
for (const ref of refs) {
  await page.goto(`${APP}/submissions?q=${ref}`);
  await page.getByRole("link", { name: ref }).first().click();
  await page.waitForURL(/submissions\/[0-9a-f-]{36}$/);
  await page.goto(page.url() + "/results");
  await page.waitForTimeout(4000);
  await page.screenshot({ path: `/tmp/shots/${email.split("@")[0]}-${ref}.png`, fullPage: true });
}
await b.close();
}
main();
