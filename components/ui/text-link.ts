// Links that read as text still need a finger-sized target: WCAG 2.2 SC 2.5.8 asks
// 24 × 24 CSS px at least, and 44 px (SC 2.5.5) where the layout allows.

/** A link standing on its own ("Forgot your password?"): a 44 px tall row target. */
export const textLinkStyles =
  "inline-flex min-h-11 items-center rounded-control underline underline-offset-4";

/** A link inside a sentence: 24 px tall, so the line around it keeps its rhythm. */
export const inlineLinkStyles =
  "inline-block min-h-6 rounded-control py-0.5 underline underline-offset-4";
