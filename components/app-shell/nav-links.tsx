"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export interface NavItem {
  href: string;
  label: string;
  /** also active on paths under these prefixes */
  match?: readonly string[];
  /** active only on exactly `href` (plus `match`) */
  exact?: boolean;
}

export interface NavLinksProps {
  items: readonly NavItem[];
}

function isActive(pathname: string, item: NavItem): boolean {
  if (pathname === item.href) return true;
  if (item.match?.some((p) => pathname === p || pathname.startsWith(`${p}/`))) return true;
  return !item.exact && pathname.startsWith(`${item.href}/`);
}

export function NavLinks({ items }: NavLinksProps) {
  const pathname = usePathname() ?? "";
  return (
    <nav aria-label="Workspace" className="-mb-px flex gap-1 overflow-x-auto">
      {items.map((item) => {
        const active = isActive(pathname, item);
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={active ? "page" : undefined}
            className={`whitespace-nowrap border-b-2 px-3 py-2.5 text-sm font-medium ${
              active ? "border-oxide-600 text-ink-900" : "border-transparent text-ink-500 hover:border-stone-300 hover:text-ink-700"
            }`}
          >
            {item.label}
          </Link>
        );
      })}
    </nav>
  );
}
