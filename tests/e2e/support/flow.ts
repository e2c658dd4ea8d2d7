// Browser-test steps through the sizing flow (/size): type a length the way it was measured, move on a
// step, wait for the answer, and size one member from the first step to "Save to a job". Used by the flow
// journey and by the paid job-sheet journey.
import type { Locator, Page } from "playwright-core";
import { KIND_LABELS, type MemberKind } from "@/lib/flow/state";
import { baseUrl } from "./browser";

/** Types into a length (or number) field and leaves it, so the flow reads it. */
/**
 * Waits until React has hydrated a field (attached its props, the internal "__reactProps$" key): typed before
 * that, the entry is reset by the form's own value when React takes the page over.
 */
export async function waitForHydrated(field: Locator): Promise<void> {
  await field.evaluate(
    (el) =>
      new Promise<void>((resolve) => {
        // at most 10 s: a field React does not own (none found so far) is typed into as before
        const until = Date.now() + 10_000;
        const ready = () => (Object.keys(el).some((k) => k.startsWith("__reactProps$")) || Date.now() > until ? resolve() : setTimeout(ready, 50));
        ready();
      }),
  );
}

export async function typeLength(page: Page, label: string | RegExp, text: string): Promise<void> {
  const field = page.getByLabel(label).first();
  await waitForHydrated(field);
  await field.fill(text);
  await field.blur();
}

/** Presses the step button named `name` and waits for the next step's heading. */
export async function nextStep(page: Page, name: RegExp): Promise<void> {
  await page.getByRole("button", { name }).click();
  await page.getByRole("heading", { level: 2, name: /^Step \d of 5/ }).waitFor();
}

/** Waits for the answer's headline and the chosen member's diagrams; returns the headline. */
export async function waitForAnswer(page: Page): Promise<string> {
  const headline = page.getByTestId("answer-headline");
  await headline.waitFor({ timeout: 30_000 });
  // the diagrams come with the chosen member's full check
  await page.getByRole("img", { name: /^Moment M/ }).waitFor({ timeout: 30_000 });
  return (await headline.textContent()) ?? "";
}

export interface MemberToSave {
  kind: MemberKind;
  /** the span as typed, e.g. "12'" */
  span: string;
  /** the member's name on the job, e.g. "DJ1 deck joists" */
  label: string;
  /** saved to a new job with this name and site address */
  newJob: { name: string; siteAddress: string };
}

/**
 * Sizes one member on a signed-in page: /size → the kind → the span → the starting loads and material →
 * the answer, then "Save to a job" into a new job. Returns the answer's headline once the save is confirmed.
 * `shot(step)` is called at each step, for screenshots.
 */
export async function sizeAndSaveMember(page: Page, member: MemberToSave, shot: (step: string) => Promise<unknown> = async () => undefined): Promise<string> {
  await page.goto(`${baseUrl()}/size`, { waitUntil: "load" });
  await page.getByRole("heading", { name: /Step 1 of 5/ }).waitFor();
  await page.getByText(KIND_LABELS[member.kind], { exact: true }).click();
  await shot("1-kind");
  await nextStep(page, /Next: Span and supports/);
  await typeLength(page, /^Span \(between supports\)/, member.span);
  await shot("2-span");
  await nextStep(page, /Next: Loads/);
  await shot("3-loads");
  await nextStep(page, /Next: Material/);
  await nextStep(page, /See the answer/);
  const headline = await waitForAnswer(page);
  await shot("5-answer");

  await page.getByRole("button", { name: "Save to a job" }).click();
  const dialog = page.getByRole("dialog", { name: "Save to a job" });
  await dialog.waitFor();
  await dialog.getByLabel("Job", { exact: true }).selectOption({ value: "new" });
  await dialog.getByLabel("New job's name").fill(member.newJob.name);
  await dialog.getByLabel("Site address").fill(member.newJob.siteAddress);
  await dialog.getByLabel(/Member name/).fill(member.label);
  await shot("6-save");
  await dialog.getByRole("button", { name: "Save" }).click();
  await page.getByText(`${member.label} saved to ${member.newJob.name}`).waitFor({ timeout: 15_000 });
  return headline;
}
