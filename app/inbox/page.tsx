import type { Metadata } from "next";
import { InboxList } from "@/components/inbox/inbox-list";
import { PageFrame } from "@/components/ui/page-frame";
import { listInbox } from "@/db/notifications";
import { requireSignedInPage } from "../_server/workspace-page";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Inbox" };

/** The person's notifications: review requests, remarks, replies, decisions, new revisions under review. */
export default async function InboxPage() {
  const user = await requireSignedInPage("/inbox");
  const items = await listInbox(user.id);
  return (
    <PageFrame eyebrow="Notifications" title="Inbox" lead={<p>What happened in the reviews you are part of. Choose which of these also come by mail on your account page.</p>}>
      <InboxList
        items={items.map((n) => ({ id: n.id, title: n.title, body: n.body, link: n.link, readAt: n.readAt?.toISOString() ?? null, createdAt: n.createdAt.toISOString() }))}
      />
    </PageFrame>
  );
}
