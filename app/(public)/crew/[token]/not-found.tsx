import type { Metadata } from "next";

export const metadata: Metadata = {
  title: "Link no longer active",
  robots: { index: false, follow: false, nocache: true },
  referrer: "no-referrer",
};

// A crew link that was revoked, ran past its date, or never existed: one plain answer for all (404).
export default function CrewLinkNotFound() {
  return (
    <section aria-labelledby="crew-gone" className="mx-auto flex max-w-xl flex-col gap-3 py-8">
      <h1 id="crew-gone" className="text-3xl font-bold">
        This link is no longer active
      </h1>
      <p className="text-lg">Ask the builder who sent it for a new link.</p>
    </section>
  );
}
