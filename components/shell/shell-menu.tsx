"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { useEffect, useId, useRef, useState } from "react";
import { cn } from "@/components/ui";
import type { Role } from "@/lib/auth/roles";
import { gardenSections } from "./garden-sections";
import { SignOutButton } from "./sign-out-button";

const itemStyles =
  "flex min-h-11 items-center rounded-control px-3 font-semibold text-soil-900 hover:bg-loam-100";

/**
 * The header's menu button and the panel it opens: the garden's sections (when in a
 * garden) and the account links. It keeps the header to one row on a phone.
 */
export function ShellMenu({
  userName,
  garden,
  className,
}: {
  userName: string;
  garden?: { id: string; role: Role };
  className?: string;
}) {
  const pathname = usePathname();
  const [open, setOpen] = useState(false);
  const [openedAt, setOpenedAt] = useState(pathname);
  const panelId = useId();
  const button = useRef<HTMLButtonElement>(null);
  // A link followed from the panel lands on a new page: the panel closes there.
  if (open && openedAt !== pathname) setOpen(false);

  useEffect(() => {
    if (!open) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key !== "Escape") return;
      setOpen(false);
      button.current?.focus();
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, [open]);

  return (
    <div className={className}>
      <button
        ref={button}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => {
          setOpenedAt(pathname);
          setOpen((o) => !o);
        }}
        className="inline-flex min-h-11 min-w-11 items-center justify-center gap-2 rounded-control border border-loam-400 bg-white px-3 font-semibold text-soil-900 hover:bg-loam-100"
      >
        <MenuIcon open={open} />
        Menu
      </button>
      <div
        id={panelId}
        hidden={!open}
        className="absolute inset-x-0 top-full z-30 max-h-[calc(100dvh-3.5rem)] overflow-y-auto border-b border-loam-200 bg-white shadow-lg"
      >
        <div className="mx-auto flex max-w-5xl flex-col gap-3 px-3 py-3">
          {garden ? (
            <nav aria-label="Garden sections">
              <ul className="grid grid-cols-2 gap-1">
                {gardenSections(garden.id, garden.role, pathname).map((s) => (
                  <li key={s.label}>
                    <Link
                      href={s.href}
                      aria-current={s.active ? "page" : undefined}
                      className={cn(itemStyles, s.active && "bg-leaf-50 text-leaf-900")}
                    >
                      {s.label}
                    </Link>
                  </li>
                ))}
              </ul>
            </nav>
          ) : null}
          <nav aria-label="Account" className="border-t border-loam-200 pt-3">
            <ul className="flex flex-col gap-1">
              <li>
                <Link href="/gardens" className={itemStyles}>
                  All gardens
                </Link>
              </li>
              <li>
                <Link href="/account" className={itemStyles}>
                  Your account ({userName})
                </Link>
              </li>
              <li>
                <SignOutButton className="w-full justify-start" />
              </li>
            </ul>
          </nav>
        </div>
      </div>
    </div>
  );
}

function MenuIcon({ open }: { open: boolean }) {
  return (
    <svg
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      aria-hidden="true"
      focusable="false"
      className="size-5 shrink-0"
    >
      {open ? <path d="M6 6l12 12M18 6L6 18" /> : <path d="M4 7h16M4 12h16M4 17h16" />}
    </svg>
  );
}
