/*
 * Shared look of text-like form controls. Borders use loam-400 so the edge of
 * an empty field meets the 3:1 non-text contrast of WCAG 1.4.11; an invalid
 * field also gets a thicker bloom border, so colour is not the only signal.
 * text-base (16 px) stops iOS Safari from zooming into a focused field.
 */
export const controlStyles = [
  "block w-full min-h-11 rounded-control border border-loam-400 bg-white px-3 py-2",
  "text-base text-soil-900 placeholder:text-soil-600",
  "disabled:cursor-not-allowed disabled:bg-loam-100 disabled:text-soil-700",
  "aria-[invalid=true]:border-2 aria-[invalid=true]:border-bloom-700",
].join(" ");
