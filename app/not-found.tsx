import type { Metadata } from "next";
import { ButtonLink } from "@/components/ui/button";
import { BlankSheetIcon } from "@/components/ui/icons";

export const metadata: Metadata = { title: "Page not found" };

// Any address that matches no page, and any record the signed-in user cannot see.
export default function NotFound() {
  return (
    <section aria-labelledby="not-found-title" className="mx-auto flex max-w-xl flex-col gap-4 py-8">
      <BlankSheetIcon className="h-12 w-12 text-graphite" />
      <h1 id="not-found-title" className="text-3xl font-bold">
        Nothing here
      </h1>
      <p className="text-lg">
        This page does not exist, or it has been taken down. A crew link stops working when its owner revokes it or it runs past its date.
      </p>
      <div className="flex flex-col gap-2 sm:flex-row">
        <ButtonLink href="/size" size="lg">
          Size a member
        </ButtonLink>
        <ButtonLink href="/jobs" variant="secondary" size="lg">
          Your jobs
        </ButtonLink>
      </div>
    </section>
  );
}
