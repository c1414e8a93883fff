import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { CapturedMailList } from "@/components/dev/captured-mail-list";
import { PageFrame } from "@/components/ui/page-frame";
import { mailFakeDir } from "../../_server/captured-mail";

export const metadata: Metadata = { title: "Captured mail" };
export const dynamic = "force-dynamic";

/** For developers and the demo: the mail the local fake caught. Not there at all when a real server sends mail. */
export default function CapturedMailPage() {
  if (!mailFakeDir()) notFound();
  return (
    <PageFrame
      eyebrow="Local mail fake"
      title="Captured mail"
      lead="Everything Backplate sent while it runs with the local mail fake; nothing here left this machine."
    >
      <CapturedMailList />
    </PageFrame>
  );
}
