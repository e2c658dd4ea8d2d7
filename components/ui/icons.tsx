import type { ReactNode, SVGProps } from "react";

// Spanlark's own small line icons, drawn on a 24-unit grid with a 2.25 stroke so they read at arm's length.
// Decorative by default (aria-hidden); pass `title` when an icon stands alone and must be announced.
export type IconProps = Omit<SVGProps<SVGSVGElement>, "children"> & { title?: string };

function IconFrame({ title, className, children, ...rest }: IconProps & { children: ReactNode }) {
  return (
    <svg
      viewBox="0 0 24 24"
      width="1em"
      height="1em"
      fill="none"
      stroke="currentColor"
      strokeWidth={2.25}
      strokeLinecap="round"
      strokeLinejoin="round"
      className={className ?? "h-5 w-5 shrink-0"}
      role={title ? "img" : undefined}
      aria-hidden={title ? undefined : true}
      focusable="false"
      {...rest}
    >
      {title ? <title>{title}</title> : null}
      {children}
    </svg>
  );
}

export function CheckIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <path d="M4.5 12.5l4.5 4.5L19.5 6.5" />
    </IconFrame>
  );
}

export function CrossIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <path d="M6 6l12 12M18 6L6 18" />
    </IconFrame>
  );
}

export function WarningIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <path d="M12 3.5L21.5 20h-19L12 3.5z" />
      <path d="M12 10v4.5" />
      <path d="M12 17.4v.1" />
    </IconFrame>
  );
}

export function InfoIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <circle cx="12" cy="12" r="9" />
      <path d="M12 11v6" />
      <path d="M12 7.4v.1" />
    </IconFrame>
  );
}

/** A tape measure's blade with ticks: "Size a member". */
export function TapeIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <rect x="2.5" y="8" width="19" height="8" rx="1.5" />
      <path d="M6.5 8v3.5M10.5 8v2M14.5 8v3.5M18.5 8v2" />
    </IconFrame>
  );
}

/** A clipboard: the job's list of members. */
export function ClipboardIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <path d="M9 4.5H6.5a1.5 1.5 0 0 0-1.5 1.5v13.5A1.5 1.5 0 0 0 6.5 21h11a1.5 1.5 0 0 0 1.5-1.5V6a1.5 1.5 0 0 0-1.5-1.5H15" />
      <rect x="9" y="3" width="6" height="3.5" rx="1" />
      <path d="M8.5 11h7M8.5 15h5" />
    </IconFrame>
  );
}

/** A hard hat: the builder's own account. */
export function HardHatIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <path d="M4 16a8 8 0 0 1 16 0" />
      <path d="M2.5 16h19v2.5h-19z" />
      <path d="M10 8.5V6h4v2.5" />
    </IconFrame>
  );
}

export function ArrowRightIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <path d="M4.5 12h15M13.5 6l6 6-6 6" />
    </IconFrame>
  );
}

export function ArrowLeftIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <path d="M19.5 12h-15M10.5 6l-6 6 6 6" />
    </IconFrame>
  );
}

export function UndoIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <path d="M8.5 5L4 9.5 8.5 14" />
      <path d="M4 9.5h10a6 6 0 0 1 0 12h-3" />
    </IconFrame>
  );
}

export function PlusIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <path d="M12 5v14M5 12h14" />
    </IconFrame>
  );
}

/** Blank squared paper: nothing here yet. */
export function BlankSheetIcon(props: IconProps) {
  return (
    <IconFrame {...props}>
      <rect x="4.5" y="3" width="15" height="18" rx="1.5" />
      <path d="M4.5 9h15M4.5 15h15M9.5 3v18M14.5 3v18" strokeWidth={1} />
    </IconFrame>
  );
}
