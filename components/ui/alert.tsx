import type { ComponentProps, ReactNode } from "react";

import { cn } from "@/components/ui/cn";
import { CautionIcon, DangerIcon, InfoIcon } from "@/components/ui/icons";

export type AlertTone = "caution" | "info" | "danger";

const tones: Record<AlertTone, { box: string; icon: string; word: string; Icon: typeof InfoIcon }> =
  {
    caution: {
      box: "border-clay-700 bg-clay-50",
      icon: "text-clay-700",
      word: "Caution",
      Icon: CautionIcon,
    },
    info: {
      box: "border-frost-700 bg-frost-50",
      icon: "text-frost-700",
      word: "Note",
      Icon: InfoIcon,
    },
    danger: {
      box: "border-bloom-700 bg-bloom-50",
      icon: "text-bloom-700",
      word: "Warning",
      Icon: DangerIcon,
    },
  };

export type AlertProps = Omit<ComponentProps<"div">, "title" | "role"> & {
  tone?: AlertTone;
  title?: ReactNode;
  /**
   * Set when the box appears in response to something just done (a failed save):
   * it becomes role="alert" and is read out at once. Standing safety cautions
   * stay role="note" so they are not shouted on every page load.
   */
  urgent?: boolean;
};

export function Alert({
  tone = "caution",
  title,
  urgent = false,
  className,
  children,
  ...props
}: AlertProps) {
  const { box, icon, word, Icon } = tones[tone];
  return (
    <div
      role={urgent ? "alert" : "note"}
      className={cn("flex gap-3 rounded-card border-l-4 px-4 py-3 text-soil-900", box, className)}
      {...props}
    >
      <Icon className={cn("mt-0.5", icon)} />
      <div className="flex flex-col gap-1">
        {/* The tone word is read out too, so colour and icon are never the only cue. */}
        {title ? (
          <p className="font-semibold">
            <span className="sr-only">{word}: </span>
            {title}
          </p>
        ) : (
          <span className="sr-only">{`${word}: `}</span>
        )}
        <div>{children}</div>
      </div>
    </div>
  );
}
