// Moving through a page with the keyboard alone, as a person who does not use a mouse does.
import type { Locator, Page } from "playwright-core";

/**
 * Presses Tab until `target` holds the focus (at most `max` presses) and checks that the focus can
 * be seen there: the control matches :focus-visible and draws an outline or a ring.
 */
export async function tabTo(page: Page, target: Locator, max = 150): Promise<void> {
  for (let i = 0; i < max; i++) {
    if (await target.evaluate((el) => el === document.activeElement).catch(() => false)) {
      const seen = await target.evaluate((el) => {
        const s = getComputedStyle(el);
        const outline = s.outlineStyle !== "none" && parseFloat(s.outlineWidth) > 0;
        return el.matches(":focus-visible") && (outline || s.boxShadow !== "none");
      });
      if (!seen) throw new Error(`The focus on ${target.toString()} is not visible.`);
      return;
    }
    await page.keyboard.press("Tab");
  }
  throw new Error(`Tab did not reach ${target.toString()} in ${max} presses.`);
}

/** Tabs to a field and types into it. */
export async function typeInto(page: Page, field: Locator, text: string): Promise<void> {
  await tabTo(page, field);
  await page.keyboard.type(text);
}

/** Tabs to a button or link and presses Enter. */
export async function activate(page: Page, control: Locator): Promise<void> {
  await tabTo(page, control);
  await page.keyboard.press("Enter");
}

/** Signs in through the form without a pointer. */
export async function signInByKeyboard(page: Page, signInUrl: string, email: string, password = "gradeline-demo"): Promise<void> {
  await page.goto(signInUrl);
  await typeInto(page, page.getByLabel("E-mail"), email);
  await typeInto(page, page.getByLabel("Password"), password);
  await page.keyboard.press("Enter");
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in") && url.pathname !== "/home", { timeout: 20_000 });
}
