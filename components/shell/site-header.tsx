"use client";

import { Link } from "@/components/ui/link";
import { usePathname } from "next/navigation";
import { cx } from "@/components/ui/cx";
import { NavIcon } from "./nav-icon";
import type { ReactNode } from "react";
import { NAV_ITEMS, isActive, isCrewPage } from "./nav-items";
import { Wordmark } from "./wordmark";

export type SiteHeaderProps = {
  /** the Admin link, rendered on the server for admins only */
  adminLink?: ReactNode;
};

/**
 * The top bar: the name (home) on every screen, the three places as a top nav on wide screens, and Admin for
 * admins on every screen size. The crew's page shows only the name: the crew has no account. A solid bar, not a
 * see-through blurred one: the blur costs a slow phone work on every scroll, and text showing through lowers the
 * contrast a builder needs in sunlight.
 */
export function SiteHeader({ adminLink }: SiteHeaderProps) {
  const pathname = usePathname() ?? "/";
  const crew = isCrewPage(pathname);
  return (
    <header className="no-print sticky top-0 z-40 border-b-2 border-rule bg-paper">
      <div className="mx-auto flex h-14 max-w-5xl items-center justify-between gap-4 px-4">
        <Link href="/" className="-ml-1 inline-flex min-h-touch items-center rounded-lg px-1 no-underline" aria-label="Spanlark home">
          <Wordmark />
        </Link>
        {crew ? null : (
          <div className="flex items-center gap-1">
            <nav aria-label="Main" className="hidden md:block">
              <ul className="flex items-center gap-1">
                {NAV_ITEMS.map((item) => {
                  const active = isActive(pathname, item.href);
                  return (
                    <li key={item.href}>
                      <Link
                        href={item.href}
                        aria-current={active ? "page" : undefined}
                        className={cx(
                          "inline-flex min-h-touch items-center gap-2 rounded-lg px-3 font-bold no-underline",
                          active ? "bg-spruce text-white" : "text-ink hover:bg-spruce-light",
                        )}
                      >
                        <NavIcon icon={item.icon} className="h-5 w-5" />
                        {item.label}
                      </Link>
                    </li>
                  );
                })}
              </ul>
            </nav>
            {adminLink}
          </div>
        )}
      </div>
    </header>
  );
}
