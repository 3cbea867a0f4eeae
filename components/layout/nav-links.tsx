"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

export interface NavItem {
  href: string;
  label: string;
}

export function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Workbook" className="flex gap-1" data-testid="main-nav">
      {items.map((item) => {
        const active = pathname === item.href || pathname.startsWith(`${item.href}/`);
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={active ? "page" : undefined}
            className={`rounded px-2.5 py-1.5 text-sm ${active ? "bg-accent-50 font-medium text-accent-800" : "text-zinc-600 hover:bg-zinc-100 hover:text-zinc-900"}`}
          >
            {item.label}
          </Link>
        );
      })}
    </nav>
  );
}
