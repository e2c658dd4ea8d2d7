import { Link, type LinkProps } from "@/components/ui/link";
import type { ReactNode } from "react";
import { ArrowLeftIcon } from "./icons";
import { cx } from "./cx";

export type PageHeaderProps = {
  title: ReactNode;
  /** One or two sentences under the title. */
  lead?: ReactNode;
  /** A way back up, e.g. { href: "/jobs", label: "Jobs" }. */
  back?: { href: LinkProps["href"]; label: string };
  /** Buttons beside the title on wide screens, under it on phones. */
  actions?: ReactNode;
  className?: string;
};

/** The page's one h1, with an optional way back and actions. */
export function PageHeader({ title, lead, back, actions, className }: PageHeaderProps) {
  return (
    <header className={cx("mb-6 flex flex-col gap-3", className)}>
      {back ? (
        <Link href={back.href} className="-ml-2 inline-flex min-h-touch w-fit items-center gap-1.5 rounded-lg px-2 font-bold">
          <ArrowLeftIcon className="h-5 w-5" />
          <span>{back.label}</span>
        </Link>
      ) : null}
      <div className="flex flex-col gap-3 md:flex-row md:items-end md:justify-between">
        <div className="min-w-0">
          <h1 className="text-3xl leading-tight font-bold text-ink">{title}</h1>
          {lead ? <p className="mt-2 max-w-prose text-lg text-ink-soft">{lead}</p> : null}
        </div>
        {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
      </div>
    </header>
  );
}
