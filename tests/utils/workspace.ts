// Steps in the inspector's job workspace, as a person does them, shared by the browser tests.
import { expect } from "vitest";
import type { Page } from "playwright-core";

export async function openSection(page: Page, id: string) {
  const header = page.locator(`#section-${id}`);
  if ((await header.getAttribute("aria-expanded")) !== "true") await header.click();
  await expect.poll(() => page.locator(`#panel-${id}`).isVisible()).toBe(true);
}

export type SegmentRow = { to: string; material: string; diameterIn: string };

/** The line profile: where the survey ended (it reached the main) and the segments from 0 ft. */
export async function recordProfile(page: Page, endFt: string, segments: SegmentRow[]) {
  await openSection(page, "profile");
  await page.getByLabel("Survey ended at").fill(endFt);
  await page.getByLabel("Reached the main").check();
  for (const [i, s] of segments.entries()) {
    await page.getByRole("button", { name: i === 0 ? "Add the first segment" : "Add a segment" }).click();
    await page.locator(`#f-segments-${i}-to`).fill(s.to);
    await page.locator(`#f-segments-${i}-material`).selectOption(s.material);
    await page.locator(`#f-segments-${i}-diameterIn`).selectOption(s.diameterIn);
  }
}

/** One locate mark: footage, depth and the surface above it. */
export async function addLocate(page: Page, index: number, mark: { at: string; depthFt: string; surface: string }) {
  await openSection(page, "locates");
  await page.getByRole("button", { name: "Add a locate mark" }).click();
  await page.locator(`#f-locates-${index}-at`).fill(mark.at);
  await page.locator(`#f-locates-${index}-depthFt`).fill(mark.depthFt);
  await page.locator(`#f-locates-${index}-surface`).selectOption(mark.surface);
}
