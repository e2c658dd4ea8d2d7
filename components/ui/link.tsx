"use client";

import NextLink from "next/link";
import { useRouter } from "next/navigation";
import type { ComponentProps, FocusEvent, PointerEvent, TouchEvent } from "react";

export type LinkProps = Omit<ComponentProps<typeof NextLink>, "prefetch">;

/**
 * Spanlark's link: the next page is fetched when the builder reaches for the link (a finger lands on it, the
 * pointer moves over it, the keyboard focuses it), not when it scrolls into view. Every page is drawn per
 * request, so fetching ahead for each link on screen (the framework's default) costs a slow phone a server
 * round trip and script time per link while the page is still starting, for links mostly never tapped.
 * The framework's guide describes this pattern ("Hover-triggered prefetch", Next.js Prefetching guide).
 */
export function Link({ href, onPointerEnter, onTouchStart, onFocus, ...rest }: LinkProps) {
  const router = useRouter();
  const warm = () => {
    const target = typeof href === "string" ? href : href.pathname ? `${href.pathname}${href.search ?? ""}` : null;
    if (target) router.prefetch(target);
  };
  return (
    <NextLink
      href={href}
      prefetch={false}
      onPointerEnter={(event: PointerEvent<HTMLAnchorElement>) => {
        warm();
        onPointerEnter?.(event);
      }}
      onTouchStart={(event: TouchEvent<HTMLAnchorElement>) => {
        warm();
        onTouchStart?.(event);
      }}
      onFocus={(event: FocusEvent<HTMLAnchorElement>) => {
        warm();
        onFocus?.(event);
      }}
      {...rest}
    />
  );
}
