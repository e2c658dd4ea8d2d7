import { ButtonLink } from "@/components/ui/button";
import { WarningIcon } from "@/components/ui/icons";

export type NotAllowedProps = { what: string };

/** Said to a signed-in account whose role does not open this page (the server refuses the data as well). */
export function NotAllowed({ what }: NotAllowedProps) {
  return (
    <div className="flex flex-col items-start gap-3 rounded-card border-2 border-over bg-over-bg p-4" data-testid="not-allowed">
      <p className="flex items-center gap-2 text-lg font-bold text-over-ink">
        <WarningIcon className="h-6 w-6 shrink-0" />
        Not for this account
      </p>
      <p>{what} is for Spanlark admins. If you need it, ask an admin to give your account the admin role.</p>
      <ButtonLink href="/account" variant="secondary">
        Back to my account
      </ButtonLink>
    </div>
  );
}
