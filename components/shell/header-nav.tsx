"use client";

import { PageLink } from "@/components/ui/page-link";
import { usePathname } from "next/navigation";
import { signOut, useSession } from "next-auth/react";
import { useMyWorkspaces } from "@/components/workspaces/use-workspaces";
import { type NavLink, PUBLIC_NAV, slugInPath, workspaceNav } from "./nav-links";

export interface HeaderUser {
  name?: string | null;
  email?: string | null;
}

function NavList({ links, pathname, label }: { links: NavLink[]; pathname: string; label: string }) {
  return (
    <nav aria-label={label} className="order-3 w-full sm:order-none sm:w-auto">
      <ul className="flex gap-5 overflow-x-auto text-sm text-paper/80">
        {links.map((link) => {
          const current = link.href === pathname;
          return (
            <li key={link.href}>
              <PageLink
                href={link.href}
                aria-current={current ? "page" : undefined}
                className="whitespace-nowrap hover:text-brass-light aria-[current=page]:text-brass-light"
              >
                {link.label}
              </PageLink>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}

/**
 * The header's right-hand part. Signed out: the landing page's sections and the way in. Signed in: the current
 * workspace's pages (the one in the address, else the first) and the person's account menu.
 */
export function HeaderNav({ serverUser }: { serverUser: HeaderUser | null }) {
  const pathname = usePathname() ?? "/";
  const session = useSession();
  // Until the client has asked for the session, the server's reading of the cookie decides (no flash on first paint).
  const user: HeaderUser | null =
    session.status === "loading" ? serverUser : session.status === "authenticated" ? (session.data.user ?? {}) : null;
  const signedIn = user !== null;
  const workspaces = useMyWorkspaces(signedIn);

  if (!signedIn) {
    return (
      <>
        <NavList links={PUBLIC_NAV} pathname={pathname} label="Main" />
        <div className="ml-auto flex items-center gap-3 text-sm">
          <PageLink href="/sign-in" className="whitespace-nowrap text-paper/90 hover:text-brass-light">
            Sign in
          </PageLink>
          <PageLink
            href="/sign-up"
            className="whitespace-nowrap rounded-md bg-brass px-3 py-1.5 font-medium text-ink hover:bg-brass-light"
          >
            Create account
          </PageLink>
        </div>
      </>
    );
  }

  const list = workspaces.data ?? [];
  const inPath = slugInPath(pathname);
  const current = list.find((w) => w.slug === inPath) ?? list[0];
  const name = user.name || user.email || "Account";

  return (
    <>
      {current ? <NavList links={workspaceNav(current.slug, current.role)} pathname={pathname} label="Workspace" /> : null}
      <div className="ml-auto flex items-center gap-3 text-sm">
        <PageLink
          href="/workspaces"
          className="hidden max-w-48 truncate rounded border border-graphite px-2 py-1 text-paper/80 hover:border-brass hover:text-brass-light sm:inline"
          title="Switch workspace"
        >
          {current ? current.name : "Workspaces"}
        </PageLink>
        {/* Re-keyed on every page change so the menu closes after a link in it is followed. */}
        <details key={pathname} className="relative">
          <summary className="flex cursor-pointer list-none items-center gap-1.5 rounded px-2 py-1 hover:bg-graphite">
            <span className="max-w-40 truncate" data-testid="signed-in-name">
              {name}
            </span>
            <span aria-hidden="true" className="text-brass-light">
              ▾
            </span>
            <span className="sr-only">account menu</span>
          </summary>
          <ul className="absolute right-0 z-40 mt-2 w-48 overflow-hidden rounded-md border border-rule bg-paper py-1 text-ink shadow-lg">
            <li>
              <PageLink href="/account" className="block px-3 py-2 hover:bg-paper-deep">
                Account
              </PageLink>
            </li>
            <li>
              <PageLink href="/workspaces" className="block px-3 py-2 hover:bg-paper-deep">
                Workspaces
              </PageLink>
            </li>
            <li>
              <button
                type="button"
                className="block w-full px-3 py-2 text-left hover:bg-paper-deep"
                onClick={() => signOut({ callbackUrl: "/" })}
              >
                Sign out
              </button>
            </li>
          </ul>
        </details>
      </div>
    </>
  );
}
