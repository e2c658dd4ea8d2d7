import type { Metadata } from "next";
import { ButtonLink } from "@/components/ui/button";
import { CardLink } from "@/components/ui/card";
import { NOT_CHECKED } from "@/lib/caution";
import { TapeIcon, WarningIcon } from "@/components/ui/icons";
import { MemberKindSketch } from "@/components/shell/member-kind-sketch";
import { KIND_LABELS, MEMBER_KINDS, type MemberKind } from "@/lib/flow/state";

export const metadata: Metadata = {
  title: { absolute: "Spanlark — size joists, headers and beams on site" },
};

const KIND_NOTES: Readonly<Record<MemberKind, string>> = {
  "floor-joist": "Joists under a floor, at the spacing you frame.",
  header: "Over a door or window, with the jack studs it needs.",
  beam: "Carries joists or a wall across an open room or basement.",
  "deck-joist": "Outdoor joists, with overhang past the beam.",
  "deck-beam": "The beam on posts that the deck joists sit on.",
  rafter: "Roof and ceiling framing under snow and dead load.",
};

const STEPS: ReadonlyArray<{ title: string; body: string }> = [
  { title: "Say what you are sizing", body: 'Pick the member, then type the span the way you measured it: 12\' 6", 12-6 or 150".' },
  { title: "Say what it carries", body: "Floor, wall, roof or snow, and how far apart the joists or the supports are." },
  { title: "Build what works", body: "Sizes that pass, best first, each check shown as a bar. Save them to a job and send the crew a link." },
];

// GET / — what Spanlark does, straight into sizing.
export default function HomePage() {
  return (
    <div className="flex flex-col gap-10">
      <section aria-labelledby="home-title" className="flex flex-col gap-4 pt-2">
        <h1 id="home-title" className="text-4xl leading-tight font-bold text-ink">
          Size the joist, header or beam in front of you.
        </h1>
        <p className="max-w-prose text-xl text-ink-soft">
          Spanlark works out which floor joists, headers, beams, deck framing and rafters carry your loads — sawn lumber, built-up plies, engineered wood or
          steel — and tells you what to build, right on your phone.
        </p>
        <div>
          <ButtonLink href="/size" size="lg" icon={<TapeIcon className="h-6 w-6" />} className="w-full sm:w-auto">
            Size a member
          </ButtonLink>
        </div>
      </section>

      <section aria-labelledby="kinds-title" className="flex flex-col gap-3">
        <h2 id="kinds-title" className="text-2xl font-bold">
          What are you sizing?
        </h2>
        <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          {MEMBER_KINDS.map((kind) => (
            <li key={kind} className="flex">
              <CardLink href={`/size?kind=${kind}`} title={KIND_LABELS[kind]} media={<MemberKindSketch kind={kind} />} className="flex-1">
                {KIND_NOTES[kind]}
              </CardLink>
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="how-title" className="flex flex-col gap-3">
        <h2 id="how-title" className="text-2xl font-bold">
          How it works
        </h2>
        <ol className="grid gap-3 md:grid-cols-3">
          {STEPS.map((step, index) => (
            <li key={step.title} className="flex gap-3 rounded-card border-2 border-rule bg-paper-raised p-4">
              <span
                aria-hidden="true"
                className="figures flex h-9 w-9 shrink-0 items-center justify-center rounded-full bg-amber-light text-lg font-bold text-ink"
              >
                {index + 1}
              </span>
              <span>
                <span className="block text-lg font-bold">{step.title}</span>
                <span className="block text-ink-soft">{step.body}</span>
              </span>
            </li>
          ))}
        </ol>
      </section>

      <section aria-labelledby="limits-title" className="flex flex-col gap-3">
        <h2 id="limits-title" className="flex items-center gap-2 text-2xl font-bold">
          <WarningIcon className="h-7 w-7 text-caution" />
          What Spanlark leaves to you
        </h2>
        <p className="max-w-prose">
          Spanlark checks the member itself: bending, shear, deflection and bearing. It does not check these — look at them on site, or ask an engineer:
        </p>
        <ul className="grid list-disc gap-1 pl-6 sm:grid-cols-2">
          {NOT_CHECKED.map((item) => (
            <li key={item}>{item}</li>
          ))}
        </ul>
      </section>
    </div>
  );
}
