"use client";

import { PageLink } from "@/components/ui/page-link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiFetch } from "@/components/api/client";
import { formatTime } from "@/components/designs/format-time";
import { secondaryButton } from "@/components/ui/buttons";

export interface InboxItem {
  id: string;
  title: string;
  body: string;
  link: string;
  readAt: string | null;
  createdAt: string;
}

/** The inbox: newest first, unread ones marked; opening one marks it read. */
export function InboxList({ items }: { items: InboxItem[] }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const mark = async (body: { ids: string[] } | { all: true }) => {
    try {
      await apiFetch("/api/notifications", { method: "POST", body });
      router.refresh();
    } catch {
      setError("Could not mark them read. Try again.");
    }
  };
  if (items.length === 0) return <p className="text-ink-soft">Nothing here yet. Review requests, remarks and decisions that involve you arrive here.</p>;
  return (
    <div className="space-y-3">
      <div className="flex justify-end">
        <button type="button" className={`${secondaryButton} px-3 py-1.5 text-sm`} onClick={() => void mark({ all: true })}>
          Mark all read
        </button>
      </div>
      {error ? <p className="text-sm text-caution">{error}</p> : null}
      <ul className="divide-y divide-rule rounded-md border border-rule bg-paper">
        {items.map((item) => (
          <li key={item.id} className={item.readAt ? "" : "bg-brass-light/15"}>
            <PageLink href={item.link} className="block px-4 py-3" onClick={() => (item.readAt ? undefined : void mark({ ids: [item.id] }))}>
              <span className="flex items-start justify-between gap-3">
                <span className={`min-w-0 break-words ${item.readAt ? "" : "font-semibold"}`}>{item.title}</span>
                {!item.readAt ? <span className="mt-1 shrink-0 text-xs text-brass-deep">unread</span> : null}
              </span>
              {item.body ? <span className="mt-1 line-clamp-2 block text-sm text-ink-soft">{item.body}</span> : null}
              <span className="mt-1 block text-xs text-ink-soft">{formatTime(item.createdAt)}</span>
            </PageLink>
          </li>
        ))}
      </ul>
    </div>
  );
}
