"use client";

import { signOut } from "next-auth/react";
import { DropdownMenu, DropdownMenuItem, DropdownMenuLabel, DropdownMenuSeparator } from "@/components/ui/dropdown-menu";

export interface AccountMenuUser {
  name: string;
  email: string;
  siteRole: "admin" | "member";
}

export interface AccountMenuProps {
  user: AccountMenuUser;
  /** Shows the development mailbox link (admins only, and only while the fake mail server is in use). */
  showMailbox?: boolean;
}

export function AccountMenu({ user, showMailbox = false }: AccountMenuProps) {
  return (
    <DropdownMenu
      label={`Account: ${user.name}`}
      trigger={
        <>
          <span
            aria-hidden="true"
            className="flex size-7 items-center justify-center rounded-full bg-accent-soft text-xs font-semibold text-accent-soft-foreground"
          >
            {initials(user.name)}
          </span>
          <span className="hidden max-w-36 truncate sm:inline">{user.name}</span>
          <svg className="size-3.5 text-muted-foreground" viewBox="0 0 16 16" fill="none" stroke="currentColor" strokeWidth="1.5" aria-hidden="true">
            <path d="M4 6l4 4 4-4" />
          </svg>
        </>
      }
    >
      <DropdownMenuLabel>
        <span className="block truncate font-medium text-foreground">{user.name}</span>
        <span className="block truncate">{user.email}</span>
      </DropdownMenuLabel>
      <DropdownMenuSeparator />
      <DropdownMenuItem href="/dashboard">Dashboard</DropdownMenuItem>
      <DropdownMenuItem href="/account">Account settings</DropdownMenuItem>
      {user.siteRole === "admin" ? <DropdownMenuItem href="/admin">Users and roles</DropdownMenuItem> : null}
      {user.siteRole === "admin" && showMailbox ? <DropdownMenuItem href="/admin/mailbox">Development mailbox</DropdownMenuItem> : null}
      <DropdownMenuSeparator />
      <DropdownMenuItem onSelect={() => void signOut({ callbackUrl: "/sign-in?signedOut=1" })}>Sign out</DropdownMenuItem>
    </DropdownMenu>
  );
}

function initials(name: string): string {
  const parts = name.trim().split(/\s+/).filter(Boolean);
  const letters = parts.length > 1 ? [parts[0]?.[0], parts.at(-1)?.[0]] : [parts[0]?.[0], parts[0]?.[1]];
  return letters.filter(Boolean).join("").toUpperCase() || "?";
}
