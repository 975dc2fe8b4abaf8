"use client";

import { usePathname } from "next/navigation";
import { DropdownMenu, DropdownMenuItem } from "@/components/ui/dropdown-menu";
import { isActiveNavItem, type NavItem } from "@/components/layout/main-nav";

export interface NavMenuProps {
  items: readonly NavItem[];
  className?: string;
}

/** The main navigation folded into one menu button, for screens too narrow for the links in a row. */
export function NavMenu({ items, className }: NavMenuProps) {
  const pathname = usePathname();
  return (
    <div className={className}>
      <DropdownMenu
        label="Menu"
        align="start"
        trigger={
          <>
            <svg className="size-4" viewBox="0 0 16 16" fill="none" stroke="currentColor" strokeWidth="1.5" aria-hidden="true">
              <path d="M2.5 4h11M2.5 8h11M2.5 12h11" />
            </svg>
            <span>Menu</span>
          </>
        }
      >
        {items.map((item) => (
          <DropdownMenuItem key={item.href} href={item.href} className={isActiveNavItem(item, pathname) ? "font-medium" : undefined}>
            {item.label}
          </DropdownMenuItem>
        ))}
      </DropdownMenu>
    </div>
  );
}
