import Link from "next/link";
import { AccountMenu, type AccountMenuUser } from "@/components/layout/account-menu";
import { MainNav, type NavItem } from "@/components/layout/main-nav";
import { NavMenu } from "@/components/layout/nav-menu";
import { MooringMark } from "@/components/layout/mooring-mark";
import { ThemeToggle } from "@/components/layout/theme-toggle";
import { ButtonLink } from "@/components/ui/button";

export interface SiteHeaderProps {
  user: AccountMenuUser | null;
  showMailbox?: boolean;
}

// Only sections that have an index page; configurations and groups are reached from the dashboard.
const workspaceNav: readonly NavItem[] = [
  { href: "/dashboard", label: "Dashboard" },
  { href: "/configurations/new", label: "New configuration" },
  { href: "/groups/new", label: "New group" },
];

const adminNav: readonly NavItem[] = [{ href: "/admin", label: "Admin" }];

export function SiteHeader({ user, showMailbox = false }: SiteHeaderProps) {
  return (
    <header className="sticky top-0 z-40 border-b border-border bg-background/85 backdrop-blur supports-[backdrop-filter]:bg-background/70">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded-md focus:bg-surface focus:px-3 focus:py-2 focus:text-sm focus:shadow-overlay"
      >
        Skip to content
      </a>
      <div className="mx-auto flex h-14 max-w-7xl items-center gap-2 px-4 sm:gap-4 sm:px-6">
        <Link href={user ? "/dashboard" : "/"} className="flex items-center gap-2 rounded-md font-semibold tracking-tight">
          <MooringMark />
          <span>Mooring</span>
        </Link>
        {user ? (
          <>
            {/* Below md the links do not fit beside the account menu: they fold into one menu button. */}
            <MainNav items={user.siteRole === "admin" ? [...workspaceNav, ...adminNav] : workspaceNav} className="hidden md:flex" />
            <NavMenu items={user.siteRole === "admin" ? [...workspaceNav, ...adminNav] : workspaceNav} className="md:hidden" />
          </>
        ) : null}
        <div className="ml-auto flex items-center gap-1.5">
          <ThemeToggle />
          {user ? (
            <AccountMenu user={user} showMailbox={showMailbox} />
          ) : (
            <>
              <ButtonLink href="/sign-in" variant="ghost" size="sm">
                Sign in
              </ButtonLink>
              <ButtonLink href="/sign-up" size="sm">
                Create account
              </ButtonLink>
            </>
          )}
        </div>
      </div>
    </header>
  );
}
