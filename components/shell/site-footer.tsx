import { Link } from "@/components/ui/link";
import { Caution } from "@/components/ui/caution";
import { AccountFooterLinks } from "./account-footer-links";

/** The foot of every page: the safety caution, then a few plain links. */
export function SiteFooter() {
  return (
    <footer className="no-print mt-12 border-t-2 border-rule bg-paper-sunk">
      <div className="mx-auto flex max-w-5xl flex-col gap-4 px-4 py-6">
        <Caution variant="short" />
        <nav aria-label="Footer">
          <ul className="flex flex-wrap gap-x-2 gap-y-1">
            <li>
              <Link href="/" className="inline-flex min-h-touch items-center px-2">
                Home
              </Link>
            </li>
            <li>
              <Link href="/size" className="inline-flex min-h-touch items-center px-2">
                Size a member
              </Link>
            </li>
            <AccountFooterLinks />
          </ul>
        </nav>
        <p className="text-ink-soft">Spanlark sizes framing members for houses and decks. Built for the job site.</p>
      </div>
    </footer>
  );
}
