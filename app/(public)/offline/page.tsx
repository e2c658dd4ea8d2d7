import type { Metadata } from "next";
import { ButtonLink } from "@/components/ui/button";

export const metadata: Metadata = { title: "No signal", robots: { index: false, follow: false } };

// GET /offline — what the phone shows for a page it never opened with a signal (precached by the service worker), no sign-in
export default function OfflinePage() {
  return (
    <section aria-labelledby="offline-title" className="mx-auto flex max-w-xl flex-col gap-4 py-8">
      <h1 id="offline-title" className="text-3xl font-bold">
        No signal, and this page is not on this phone yet
      </h1>
      <p className="text-lg">
        Sizing still works: Spanlark works the answer out on this phone with the material tables it keeps, and the server checks it again when the signal comes
        back. Saves wait on this phone and are sent then.
      </p>
      <p className="text-lg">Pages you have opened with a signal, such as a crew link, can be read here too.</p>
      <ButtonLink href="/size" size="lg" className="w-full sm:w-fit">
        Size a member
      </ButtonLink>
    </section>
  );
}
