import type { Metadata } from "next";
import { NameForm, PasswordForm } from "@/components/account/account-forms";
import { NotificationPreferencesForm } from "@/components/account/notification-preferences-form";
import { getPreferences } from "@/db/notifications";
import { PageFrame } from "@/components/ui/page-frame";
import { requireSignedInPage } from "../_server/workspace-page";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const user = await requireSignedInPage("/account");
  const preferences = await getPreferences(user.id);
  return (
    <PageFrame eyebrow="Your account" title="Account" lead={<p>Signed in as {user.email}.</p>}>
      <div className="grid gap-6 md:grid-cols-2">
        <section className="rounded-lg border border-rule bg-paper-deep/60 p-5">
          <h2 className="mb-4 text-lg font-bold">Name</h2>
          <NameForm name={user.name ?? ""} />
        </section>
        <section className="rounded-lg border border-rule bg-paper-deep/60 p-5">
          <h2 className="mb-4 text-lg font-bold">Password</h2>
          <PasswordForm />
        </section>
        <section className="rounded-lg border border-rule bg-paper-deep/60 p-5 md:col-span-2">
          <h2 className="mb-4 text-lg font-bold">Notification mail</h2>
          <NotificationPreferencesForm initial={preferences} />
        </section>
      </div>
    </PageFrame>
  );
}
