import type { Page } from "playwright-core";

/** A target smaller than WCAG 2.2 SC 2.5.8 allows (24 × 24 CSS px). */
export interface SmallTarget {
  what: string;
  width: number;
  height: number;
}

/** What a grower would trip on, measured on the page as it stands. */
export interface PageAudit {
  url: string;
  /** Pixels the page scrolls sideways (0 when it fits). */
  overflow: number;
  smallTargets: SmallTarget[];
}

// WCAG 2.2 SC 2.5.8 "Target Size (Minimum)": 24 by 24 CSS pixels. We hold every
// visible control to it, inline links included (the issue asks for that), and
// measure a checkbox or radio by the <label> around it, since a tap on the label
// toggles it (HTML "labelable elements": the label's activation behaviour).
const MIN = 24;

export async function auditPage(page: Page): Promise<PageAudit> {
  const measured = await page.evaluate((min) => {
    const selector =
      'a[href], button, input:not([type="hidden"]), select, textarea, summary, [role="button"], [role="link"], [tabindex]:not([tabindex="-1"])';
    const small: { what: string; width: number; height: number }[] = [];
    for (const el of Array.from(document.querySelectorAll<HTMLElement>(selector))) {
      if (!el.checkVisibility({ checkOpacity: true, checkVisibilityCSS: true })) continue;
      const own = el.getBoundingClientRect();
      // Screen-reader-only content (1 × 1 px, clipped) is not a pointer target.
      if (own.width <= 1 || own.height <= 1) continue;
      const wrapping = el.closest("label");
      const box =
        el instanceof HTMLInputElement &&
        (el.type === "checkbox" || el.type === "radio") &&
        wrapping
          ? wrapping.getBoundingClientRect()
          : own;
      if (box.width + 0.5 < min || box.height + 0.5 < min) {
        const name = (el.getAttribute("aria-label") ?? el.textContent ?? "").trim().slice(0, 40);
        small.push({
          what: `${el.tagName.toLowerCase()} "${name}"`,
          width: Math.round(box.width),
          height: Math.round(box.height),
        });
      }
    }
    return {
      overflow: document.documentElement.scrollWidth - window.innerWidth,
      small,
    };
  }, MIN);
  return { url: page.url(), overflow: measured.overflow, smallTargets: measured.small };
}
