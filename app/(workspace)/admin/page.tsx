import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { SiteRoleForm } from "@/components/admin/site-role-form";
import { PageContainer } from "@/components/layout/page-container";
import { Button, ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Input } from "@/components/ui/input";
import { PageHeader } from "@/components/ui/page-header";
import { Table, TableBody, TableCaption, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import { isSiteAdmin } from "@/db/queries/actor";
import { listUsers } from "@/db/queries/users";
import { getEnv } from "@/lib/server/env";
import { formatDate } from "@/lib/format-date";
import { requireUser } from "@/lib/server/session";
import { countOf } from "@/lib/wording";

export const metadata: Metadata = { title: "Users and roles" };

export default async function AdminPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireUser("/admin");
  // Non-admins get the same 404 as a missing page: the admin area does not announce itself.
  if (!isSiteAdmin(user)) notFound();
  const params = await searchParams;
  const search = typeof params.q === "string" ? params.q.slice(0, 100) : "";
  const { items, total } = await listUsers(user, { search, limit: 200 });

  return (
    <PageContainer className="grid gap-6">
      <PageHeader
        eyebrow="Administration"
        title="Users and roles"
        description="Every account on this site. Admins manage accounts and roles; members work in their groups."
        actions={
          getEnv().MAILBOX_URL ? (
            <ButtonLink href="/admin/mailbox" variant="outline">
              Development mailbox
            </ButtonLink>
          ) : null
        }
      />
      <form role="search" className="flex max-w-md gap-2" action="/admin">
        <Input name="q" type="search" defaultValue={search} placeholder="Search by name or e-mail" aria-label="Search users" />
        <Button type="submit" variant="secondary">
          Search
        </Button>
      </form>
      {items.length === 0 ? (
        <EmptyState
          title="No matching accounts"
          description={`Nobody's name or e-mail contains “${search}”.`}
          action={
            <Link href="/admin" className="text-sm font-medium text-accent hover:underline">
              Show everyone
            </Link>
          }
        />
      ) : (
        <Table>
          <TableCaption>
            {items.length === total ? countOf(total, "account") : `${items.length} of ${countOf(total, "account")}`}
            {search ? ` matching “${search}”` : ""}
          </TableCaption>
          <TableHeader>
            <TableRow>
              <TableHead>Name</TableHead>
              <TableHead>E-mail</TableHead>
              <TableHead>Site role</TableHead>
              <TableHead>Created</TableHead>
            </TableRow>
          </TableHeader>
          <TableBody>
            {items.map((row) => (
              <TableRow key={row.id}>
                <TableCell className="font-medium">
                  {row.name}
                  {row.id === user.id ? <span className="ml-2 text-xs font-normal text-muted-foreground">(you)</span> : null}
                </TableCell>
                <TableCell>
                  <span className="font-mono text-[13px]">{row.email}</span>
                </TableCell>
                <TableCell>
                  <SiteRoleForm userId={row.id} userName={row.name} siteRole={row.siteRole} />
                </TableCell>
                <TableCell className="whitespace-nowrap text-muted-foreground">{formatDate(row.createdAt)}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </PageContainer>
  );
}
