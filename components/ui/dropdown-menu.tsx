"use client";

import * as MenuPrimitive from "@radix-ui/react-dropdown-menu";
import Link from "next/link";
import { useRef, useState, type FocusEvent, type KeyboardEvent, type ReactNode } from "react";
import { useHydrated } from "@/lib/client/use-hydrated";
import { cn } from "@/lib/utils";

export interface DropdownMenuProps {
  /** Content of the trigger button. */
  trigger: ReactNode;
  /** Accessible name of the trigger (and so of the menu) when its content is not descriptive text (e.g. an avatar). */
  label?: string;
  children: ReactNode;
  align?: "start" | "end";
  triggerClassName?: string;
  className?: string;
}

/**
 * A menu button on Radix's dropdown menu (the WAI-ARIA menu button pattern): Enter, Space or ArrowDown
 * opens it on the first item and ArrowUp on the last; arrows (wrapping), Home, End and typing a letter
 * move; Escape closes and returns focus to the trigger; a click outside closes.
 * The trigger stays disabled until React has hydrated, so a click on the server-rendered button is never lost.
 * Non-modal: the page keeps scrolling and a click outside reaches what it lands on.
 */
export function DropdownMenu({ trigger, label, children, align = "end", triggerClassName, className }: DropdownMenuProps) {
  const [open, setOpen] = useState(false);
  const hydrated = useHydrated();
  // Radix opens on the first item only; ArrowUp on the trigger opens on the last, as the pattern suggests.
  const focusLastOnOpen = useRef(false);

  function onTriggerKeyDown(event: KeyboardEvent<HTMLButtonElement>) {
    if (event.key !== "ArrowUp" || open) return;
    event.preventDefault();
    focusLastOnOpen.current = true;
    setOpen(true);
  }

  // Radix moves focus to the first item as the menu opens; when that focus arrives, pass it on to the last.
  function onMenuFocus(event: FocusEvent<HTMLDivElement>) {
    if (!focusLastOnOpen.current || event.target === event.currentTarget) return;
    focusLastOnOpen.current = false;
    const items = event.currentTarget.querySelectorAll<HTMLElement>('[role="menuitem"]:not([data-disabled])');
    const last = items[items.length - 1];
    if (last && last !== event.target) last.focus();
  }

  return (
    <MenuPrimitive.Root open={open} onOpenChange={setOpen} modal={false}>
      <MenuPrimitive.Trigger
        aria-label={label}
        disabled={!hydrated}
        onKeyDown={onTriggerKeyDown}
        className={cn(
          "inline-flex items-center gap-2 rounded-md px-2 py-1.5 text-sm hover:bg-surface-muted focus-visible:outline-2 focus-visible:outline-ring",
          triggerClassName,
        )}
      >
        {trigger}
      </MenuPrimitive.Trigger>
      <MenuPrimitive.Portal>
        <MenuPrimitive.Content
          align={align}
          sideOffset={6}
          loop
          onFocus={onMenuFocus}
          className={cn("z-50 min-w-52 rounded-md border border-border bg-surface-raised p-1 shadow-overlay", className)}
        >
          {children}
        </MenuPrimitive.Content>
      </MenuPrimitive.Portal>
    </MenuPrimitive.Root>
  );
}

const itemClassName =
  "flex w-full cursor-default items-center gap-2 rounded-sm px-2.5 py-1.5 text-left text-sm text-foreground outline-none select-none data-highlighted:bg-surface-muted";

export interface DropdownMenuItemProps {
  children: ReactNode;
  /** Navigates like a link when set. */
  href?: string;
  /** Runs when the item is chosen (click, Enter or Space). */
  onSelect?: () => void;
  variant?: "default" | "danger";
  className?: string;
}

export function DropdownMenuItem({ children, href, onSelect, variant = "default", className }: DropdownMenuItemProps) {
  const classes = cn(itemClassName, href && "cursor-pointer", variant === "danger" && "text-danger-soft-foreground", className);
  if (href) {
    // Enter on the item clicks the link, so Next's client-side navigation runs as for a mouse click.
    return (
      <MenuPrimitive.Item asChild onSelect={() => onSelect?.()} className={classes}>
        <Link href={href}>{children}</Link>
      </MenuPrimitive.Item>
    );
  }
  return (
    <MenuPrimitive.Item onSelect={() => onSelect?.()} className={classes}>
      {children}
    </MenuPrimitive.Item>
  );
}

export function DropdownMenuLabel({ children, className }: { children: ReactNode; className?: string }) {
  return <MenuPrimitive.Label className={cn("px-2.5 py-1.5 text-xs text-muted-foreground", className)}>{children}</MenuPrimitive.Label>;
}

export function DropdownMenuSeparator() {
  return <MenuPrimitive.Separator className="my-1 h-px bg-border" />;
}
