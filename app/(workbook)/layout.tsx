import Link from "next/link";
import { NAV_ITEMS } from "@/components/layout/nav-items";
import { NavLinks } from "@/components/layout/nav-links";
import { Brand } from "@/components/ui/brand";
import { getPageContext } from "@/lib/auth/page";
import { ROLE_LABELS } from "@/lib/auth/permissions";

export default async function WorkbookLayout({ children }: { children: React.ReactNode }) {
  const { member, permissions, accountCount } = await getPageContext();
  const items = NAV_ITEMS.filter((i) => permissions.includes(i.permission)).map(({ href, label }) => ({
    href,
    label,
  }));
  return (
    <div className="min-h-screen">
      <header className="border-b border-zinc-200 bg-white">
        <div className="flex items-center gap-6 px-4 py-2">
          <Link href="/plans" aria-label="Platload home">
            <Brand />
          </Link>
          <NavLinks items={items} />
          <div className="ml-auto flex items-center gap-3 text-xs text-zinc-600">
            <span data-testid="account-name" className="font-medium text-zinc-800">
              {member.accountName}
            </span>
            {accountCount > 1 ? (
              <Link href="/accounts" className="text-accent-700 underline-offset-2 hover:underline">
                Switch account
              </Link>
            ) : null}
            <span aria-label="Signed in as">
              {member.name} · <span data-testid="role-badge">{ROLE_LABELS[member.role]}</span>
            </span>
            <Link href="/sign-out" className="text-accent-700 underline-offset-2 hover:underline">
              Sign out
            </Link>
          </div>
        </div>
      </header>
      <main className="px-4 py-4">{children}</main>
    </div>
  );
}
