import Link from "next/link";
import type { ReactNode } from "react";
import { CAUTION } from "@/lib/caution";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { ProductMark } from "./product-mark";
import { NavLinks, type NavItem } from "./nav-links";
import { WorkspaceSwitcher, type WorkspaceOption } from "./workspace-switcher";

export interface AppShellProps {
  user: { name: string; email: string };
  workspaces: readonly WorkspaceOption[];
  /** the workspace being shown; absent on pages outside any workspace (account settings) */
  current?: WorkspaceOption;
  /** the owner reads captured mail while mail goes to the local catcher */
  showMail?: boolean;
  children: ReactNode;
}

/** Navigation of a workspace: Projects, Members, Mail (owner, development only), Account. */
export function workspaceNav(workspaceId: string, showMail: boolean): NavItem[] {
  const base = `/w/${workspaceId}`;
  const items: NavItem[] = [
    { href: base, label: "Projects", exact: true, match: [`${base}/projects`, `${base}/p`] },
    { href: `${base}/members`, label: "Members" },
  ];
  if (showMail) items.push({ href: `${base}/mail`, label: "Mail" });
  items.push({ href: "/account", label: "Account" });
  return items;
}

/**
 * The signed-in frame around every workspace page: product name, workspace switcher, navigation,
 * the person and sign-out, and the caution in the footer. Pages put their own heading and content
 * inside; the shell knows nothing about projects.
 */
export function AppShell({ user, workspaces, current, showMail = false, children }: AppShellProps) {
  const items = current ? workspaceNav(current.id, showMail) : [{ href: "/account", label: "Account" }];
  return (
    <div className="flex min-h-screen flex-col bg-stone-25">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-4 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:px-3 focus:py-1">
        Skip to content
      </a>
      <header className="no-print border-b border-stone-200 bg-white">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-4 gap-y-2 px-4 pt-3 sm:px-6">
          <ProductMark href="/w" />
          <span aria-hidden className="hidden h-5 w-px bg-stone-200 sm:block" />
          <WorkspaceSwitcher workspaces={workspaces} currentId={current?.id} />
          <div className="ml-auto flex items-center gap-3">
            <Link href="/account" className="hidden text-right text-sm leading-tight sm:block">
              <span className="block font-medium text-ink-900">{user.name || user.email}</span>
              <span className="block text-xs text-ink-500">
                {current ? `${current.role} · ` : ""}
                {user.email}
              </span>
            </Link>
            <SignOutButton />
          </div>
        </div>
        <div className="mx-auto max-w-7xl px-4 sm:px-6">
          <NavLinks items={items} />
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-6 sm:px-6">
        {children}
      </main>
      <footer className="border-t border-stone-200 bg-stone-50">
        <p className="mx-auto max-w-7xl px-4 py-4 text-xs text-ink-500 sm:px-6">{CAUTION}</p>
      </footer>
    </div>
  );
}
