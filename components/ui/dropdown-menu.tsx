"use client";

import Link from "next/link";
import {
  createContext,
  useCallback,
  useContext,
  useEffect,
  useId,
  useRef,
  useState,
  type KeyboardEvent,
  type ReactNode,
} from "react";
import { useHydrated } from "@/lib/client/use-hydrated";
import { cn } from "@/lib/utils";

interface MenuContextValue {
  close: (options?: { restoreFocus?: boolean }) => void;
}

const MenuContext = createContext<MenuContextValue | null>(null);

export interface DropdownMenuProps {
  /** Content of the trigger button. */
  trigger: ReactNode;
  /** Accessible name of the trigger when its content is not descriptive text (e.g. an avatar). */
  label?: string;
  children: ReactNode;
  align?: "start" | "end";
  triggerClassName?: string;
  className?: string;
}

/**
 * A menu button following the WAI-ARIA menu pattern: Enter, Space or ArrowDown opens it and focuses the
 * first item; arrows, Home and End move; Escape closes and returns focus; Tab or a click outside closes.
 * The trigger stays disabled until React has hydrated, so a click on the server-rendered button is never lost.
 */
export function DropdownMenu({ trigger, label, children, align = "end", triggerClassName, className }: DropdownMenuProps) {
  const [open, setOpen] = useState(false);
  const triggerRef = useRef<HTMLButtonElement>(null);
  const menuRef = useRef<HTMLDivElement>(null);
  const pendingFocus = useRef<"first" | "last" | null>(null);
  const menuId = useId();
  const hydrated = useHydrated();

  const items = useCallback(
    () => Array.from(menuRef.current?.querySelectorAll<HTMLElement>('[role="menuitem"]:not([aria-disabled="true"])') ?? []),
    [],
  );

  const close = useCallback((options?: { restoreFocus?: boolean }) => {
    setOpen(false);
    if (options?.restoreFocus ?? true) triggerRef.current?.focus();
  }, []);

  useEffect(() => {
    if (!open) return;
    const target = pendingFocus.current === "last" ? items().at(-1) : items()[0];
    pendingFocus.current = null;
    target?.focus();

    function onPointerDown(event: PointerEvent) {
      const node = event.target as Node;
      if (!menuRef.current?.contains(node) && !triggerRef.current?.contains(node)) setOpen(false);
    }
    document.addEventListener("pointerdown", onPointerDown);
    return () => document.removeEventListener("pointerdown", onPointerDown);
  }, [open, items]);

  function onTriggerKeyDown(event: KeyboardEvent<HTMLButtonElement>) {
    if (event.key === "ArrowDown" || event.key === "ArrowUp") {
      event.preventDefault();
      pendingFocus.current = event.key === "ArrowUp" ? "last" : "first";
      setOpen(true);
    }
  }

  function onMenuKeyDown(event: KeyboardEvent<HTMLDivElement>) {
    const list = items();
    const index = list.indexOf(document.activeElement as HTMLElement);
    const focusAt = (i: number) => list[(i + list.length) % list.length]?.focus();
    switch (event.key) {
      case "ArrowDown":
        event.preventDefault();
        focusAt(index + 1);
        break;
      case "ArrowUp":
        event.preventDefault();
        focusAt(index - 1);
        break;
      case "Home":
        event.preventDefault();
        focusAt(0);
        break;
      case "End":
        event.preventDefault();
        focusAt(list.length - 1);
        break;
      case "Escape":
        event.preventDefault();
        close();
        break;
      case "Tab":
        close({ restoreFocus: false });
        break;
    }
  }

  return (
    <MenuContext.Provider value={{ close }}>
      <div className="relative">
        <button
          ref={triggerRef}
          type="button"
          aria-haspopup="menu"
          aria-expanded={open}
          aria-controls={open ? menuId : undefined}
          aria-label={label}
          disabled={!hydrated}
          onClick={() => setOpen((value) => !value)}
          onKeyDown={onTriggerKeyDown}
          className={cn(
            "inline-flex items-center gap-2 rounded-md px-2 py-1.5 text-sm hover:bg-surface-muted focus-visible:outline-2 focus-visible:outline-ring",
            triggerClassName,
          )}
        >
          {trigger}
        </button>
        {open ? (
          <div
            ref={menuRef}
            id={menuId}
            role="menu"
            aria-label={label}
            onKeyDown={onMenuKeyDown}
            className={cn(
              "absolute z-50 mt-1.5 min-w-52 rounded-md border border-border bg-surface-raised p-1 shadow-overlay",
              align === "end" ? "right-0" : "left-0",
              className,
            )}
          >
            {children}
          </div>
        ) : null}
      </div>
    </MenuContext.Provider>
  );
}

const itemClassName =
  "flex w-full items-center gap-2 rounded-sm px-2.5 py-1.5 text-left text-sm text-foreground outline-none hover:bg-surface-muted focus:bg-surface-muted";

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
  const menu = useContext(MenuContext);
  const classes = cn(itemClassName, variant === "danger" && "text-danger-soft-foreground", className);
  const choose = () => {
    menu?.close({ restoreFocus: !href });
    onSelect?.();
  };

  if (href) {
    return (
      <Link href={href} role="menuitem" tabIndex={-1} className={classes} onClick={choose}>
        {children}
      </Link>
    );
  }
  return (
    <button type="button" role="menuitem" tabIndex={-1} className={classes} onClick={choose}>
      {children}
    </button>
  );
}

export function DropdownMenuLabel({ children, className }: { children: ReactNode; className?: string }) {
  return (
    <div role="presentation" className={cn("px-2.5 py-1.5 text-xs text-muted-foreground", className)}>
      {children}
    </div>
  );
}

export function DropdownMenuSeparator() {
  return <div role="separator" className="my-1 h-px bg-border" />;
}
