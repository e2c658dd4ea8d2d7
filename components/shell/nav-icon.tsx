import { ClipboardIcon, HardHatIcon, TapeIcon } from "@/components/ui/icons";
import type { NavItem } from "./nav-items";

export function NavIcon({ icon, className }: { icon: NavItem["icon"]; className?: string }) {
  if (icon === "tape") return <TapeIcon className={className} />;
  if (icon === "clipboard") return <ClipboardIcon className={className} />;
  return <HardHatIcon className={className} />;
}
