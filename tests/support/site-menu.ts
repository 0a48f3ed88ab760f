import type { Page } from "@playwright/test";

/**
 * Below 1024 px the header's links, search and account sit behind its "Menu" button
 * (components/shell/header-menu.tsx). Opens it when the button is shown and closed; at desktop
 * widths, where everything is already in view, it does nothing. Call it before clicking a header
 * link, the name or "Sign out" at a phone or tablet width.
 */
export async function openSiteMenu(page: Page): Promise<void> {
  const button = page.getByRole("banner").getByRole("button", { name: "Menu", exact: true });
  if (!(await button.isVisible())) return;
  if ((await button.getAttribute("aria-expanded")) !== "true") await button.click();
  await page.locator(`#${await button.getAttribute("aria-controls")}`).waitFor({ state: "visible" });
}
