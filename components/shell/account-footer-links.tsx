"use client";

import { Link } from "@/components/ui/link";
import { usePathname } from "next/navigation";
import { isCrewPage } from "./nav-items";

/** Jobs and Account in the footer, except on the crew's page (the crew has no account). */
export function AccountFooterLinks() {
  const pathname = usePathname() ?? "/";
  if (isCrewPage(pathname)) return null;
  return (
    <>
      <li>
        <Link href="/jobs" className="inline-flex min-h-touch items-center px-2">
          Jobs
        </Link>
      </li>
      <li>
        <Link href="/account" className="inline-flex min-h-touch items-center px-2">
          Account
        </Link>
      </li>
    </>
  );
}
