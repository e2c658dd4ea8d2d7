"use client";

import { Link } from "@/components/ui/link";
import { usePathname } from "next/navigation";
import { cx } from "@/components/ui/cx";
import { NavIcon } from "./nav-icon";
import { NAV_ITEMS, isActive, isCrewPage } from "./nav-items";

/** The phone's navigation, at the bottom where the thumb reaches; hidden on wide screens (the header has it). */
export function BottomNav() {
  const pathname = usePathname() ?? "/";
  if (isCrewPage(pathname)) return null;
  return (
    <nav
      aria-label="Main"
      className="no-print fixed inset-x-0 bottom-0 z-40 border-t-2 border-ink bg-paper md:hidden"
      style={{ paddingBottom: "env(safe-area-inset-bottom, 0px)" }}
    >
      <ul className="grid h-16 grid-cols-3">
        {NAV_ITEMS.map((item) => {
          const active = isActive(pathname, item.href);
          return (
            <li key={item.href} className="flex">
              <Link
                href={item.href}
                aria-current={active ? "page" : undefined}
                className={cx(
                  "flex flex-1 flex-col items-center justify-center gap-0.5 px-1 text-sm leading-tight font-bold no-underline",
                  active ? "bg-spruce text-white" : "text-ink active:bg-spruce-light",
                )}
              >
                <NavIcon icon={item.icon} className="h-6 w-6" />
                <span>{item.label}</span>
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
