// The app's three places, in the order the thumb meets them on the bottom bar.
export type NavItem = { href: "/size" | "/jobs" | "/account"; label: string; icon: "tape" | "clipboard" | "hardhat" };

export const NAV_ITEMS: readonly NavItem[] = [
  { href: "/size", label: "Size a member", icon: "tape" },
  { href: "/jobs", label: "Jobs", icon: "clipboard" },
  { href: "/account", label: "Account", icon: "hardhat" },
];

/** True when the path is the item's page or one under it (/jobs/42 is in Jobs). */
export function isActive(pathname: string, href: string): boolean {
  return pathname === href || pathname.startsWith(`${href}/`);
}

/** The crew's read-only page: no tabs meant for signed-in builders (the crew has no account). */
export function isCrewPage(pathname: string): boolean {
  return pathname.startsWith("/crew/");
}
