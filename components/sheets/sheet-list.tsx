import { CardLink } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { formatSheetDateTime } from "@/lib/sheets/format";
import type { SheetListItem } from "@/lib/sheets/sheets";

export type SheetListProps = {
  sheets: readonly SheetListItem[];
  emptyHint: string;
};

export function SheetList({ sheets, emptyHint }: SheetListProps) {
  if (sheets.length === 0) return <EmptyState title="No job sheets yet" body={emptyHint} />;
  return (
    <ul className="flex flex-col gap-3" aria-label="Job sheets">
      {sheets.map((s) => (
        <li key={s.id}>
          <CardLink href={`/sheets/${s.id}`} title={s.jobName}>
            Saved {formatSheetDateTime(s.savedAt)} · {s.memberCount} member{s.memberCount === 1 ? "" : "s"} · tables {s.tablesLabel}
          </CardLink>
        </li>
      ))}
    </ul>
  );
}
