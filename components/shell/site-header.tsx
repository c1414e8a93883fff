import { PageLink } from "@/components/ui/page-link";
import { BackplateMark } from "@/components/brand/backplate-mark";
import { InboxLink } from "@/components/inbox/inbox-link";
import { HeaderNav, type HeaderUser } from "./header-nav";

/** The header. `serverUser` is the layout's reading of the session cookie, so the first paint is already right. */
export function SiteHeader({ serverUser }: { serverUser: HeaderUser | null }) {
  return (
    <header className="sticky top-0 z-30 border-b border-graphite bg-ink text-paper">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
        <PageLink href="/" className="flex items-center gap-2.5" aria-label="Backplate home">
          <BackplateMark />
          <span className="font-display text-lg font-bold tracking-tight">Backplate</span>
        </PageLink>
        <HeaderNav serverUser={serverUser} />
        {serverUser ? <InboxLink /> : null}
      </div>
    </header>
  );
}
