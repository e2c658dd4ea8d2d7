import { Link, type LinkProps } from "@/components/ui/link";
import type { HTMLAttributes, ReactNode } from "react";
import { ArrowRightIcon } from "./icons";
import { cx } from "./cx";

export type CardProps = HTMLAttributes<HTMLElement> & {
  /** The element drawn: a section by default, an article or li where the list calls for it. */
  as?: "section" | "article" | "div" | "li";
  title?: ReactNode;
  /** The heading level of the title; h2 by default. */
  titleLevel?: 2 | 3;
};

export function Card({ as: Element = "section", title, titleLevel = 2, className, children, ...rest }: CardProps) {
  const Heading = titleLevel === 3 ? "h3" : "h2";
  return (
    <Element className={cx("rounded-card border-2 border-rule bg-paper-raised p-4", className)} {...rest}>
      {title ? <Heading className="mb-2 text-lg font-bold text-ink">{title}</Heading> : null}
      {children}
    </Element>
  );
}

export type CardLinkProps = {
  href: LinkProps["href"];
  title: ReactNode;
  children?: ReactNode;
  /** An icon or small drawing at the card's left. */
  media?: ReactNode;
  className?: string;
};

/** A whole card that is one link: a big target for a thumb, with an arrow saying it goes somewhere. */
export function CardLink({ href, title, children, media, className }: CardLinkProps) {
  return (
    <Link
      href={href}
      className={cx(
        "group flex min-h-touch-lg items-center gap-3 rounded-card border-2 border-rule bg-paper-raised p-4 text-ink no-underline",
        "hover:border-spruce active:bg-spruce-light",
        className,
      )}
    >
      {media ? <span className="shrink-0 text-spruce">{media}</span> : null}
      <span className="flex min-w-0 flex-1 flex-col">
        <span className="text-lg font-bold text-ink group-hover:underline">{title}</span>
        {children ? <span className="text-ink-soft">{children}</span> : null}
      </span>
      <ArrowRightIcon className="h-6 w-6 shrink-0 text-spruce" />
    </Link>
  );
}
