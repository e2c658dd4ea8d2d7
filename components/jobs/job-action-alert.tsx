import { ButtonLink } from "@/components/ui/button";

/** What a job action refused, in words; `upgrade` is where the plans are when the free plan's limit was the reason. */
export type JobActionProblem = { message: string; upgrade?: string };

export type JobActionAlertProps = { problem: JobActionProblem };

/** A job action's refusal, with a way to the plans when a limit was the reason. */
export function JobActionAlert({ problem }: JobActionAlertProps) {
  return (
    <div role="alert" className="rounded-lg border-2 border-over bg-over-bg p-3 font-bold text-over-ink">
      {problem.message}
      {problem.upgrade ? (
        <div className="mt-2">
          <ButtonLink href={problem.upgrade} variant="secondary">
            See the plans
          </ButtonLink>
        </div>
      ) : null}
    </div>
  );
}
