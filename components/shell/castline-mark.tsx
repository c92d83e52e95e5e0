import { cn } from "@/components/ui";

/** Castline's mark (the same drawing as public/icon.svg): a worm's trail over a tray. */
export function CastlineMark({ className }: { className?: string }) {
  return (
    <svg
      viewBox="0 0 32 32"
      aria-hidden="true"
      focusable="false"
      className={cn("size-8 shrink-0", className)}
    >
      <rect width="32" height="32" rx="7" className="fill-leaf-700" />
      <path
        d="M6 21c4-7 8 3 12-3s6-6 8-4"
        fill="none"
        className="stroke-loam-50"
        strokeWidth="3"
        strokeLinecap="round"
      />
      <path d="M8 25h16" className="stroke-clay-200" strokeWidth="2.5" strokeLinecap="round" />
    </svg>
  );
}
