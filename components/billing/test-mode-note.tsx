import { InfoIcon } from "@/components/ui/icons";

/** Said wherever a payment starts while payments run in test mode, so nobody reaches for a real card. */
export function TestModeNote() {
  return (
    <p className="flex items-start gap-2 rounded-card border-2 border-rule bg-paper-sunk p-3 text-ink" data-testid="test-mode-note">
      <InfoIcon className="mt-0.5 h-5 w-5 shrink-0 text-spruce" />
      <span>
        Test mode: no real card is charged. Pay with <span className="figures font-bold">4242 4242 4242 4242</span>; the card{" "}
        <span className="figures font-bold">4000 0000 0000 0002</span> is declined.
      </span>
    </p>
  );
}
