"use client";

import { useQuery } from "@tanstack/react-query";
import { PageLink } from "@/components/ui/page-link";
import { usePathname } from "next/navigation";
import { apiFetch } from "@/components/api/client";

/** How often the header asks for the unread count (a notification made by someone else shows up within this). */
const POLL_MS = 30_000;

/** The header's way to the inbox, with the number of unread notifications. */
export function InboxLink() {
  const pathname = usePathname();
  const unread = useQuery({
    queryKey: ["notifications", "unread", pathname],
    queryFn: () => apiFetch<{ unread: number }>("/api/notifications?unread=1"),
    refetchInterval: POLL_MS,
    retry: false,
  });
  const count = unread.data?.unread ?? 0;
  return (
    <PageLink
      href="/inbox"
      className="flex items-center gap-1.5 whitespace-nowrap rounded px-2 py-1 text-sm text-paper/90 hover:bg-graphite hover:text-brass-light"
      data-testid="inbox-link"
    >
      Inbox
      {count > 0 ? (
        <span data-testid="inbox-count" className="rounded-full bg-brass px-1.5 text-xs font-semibold text-ink">
          {count > 99 ? "99+" : count}
          <span className="sr-only"> unread</span>
        </span>
      ) : null}
    </PageLink>
  );
}
