"use client";

import { useState } from "react";
import { ApiError, apiFetch } from "@/components/api/client";
import { NOTIFICATION_KIND_LABELS, NOTIFICATION_KINDS, type NotificationKind, notificationPreferencesSchema } from "@/components/schemas/review";
import { primaryButton } from "@/components/ui/buttons";

export interface PreferencesValue {
  emailEnabled: boolean;
  email: Partial<Record<NotificationKind, boolean>>;
}

/** E-mail on or off, in all and per kind of notification. The inbox keeps every notification either way. */
export function NotificationPreferencesForm({ initial }: { initial: PreferencesValue }) {
  const [value, setValue] = useState(initial);
  const [state, setState] = useState<{ tone: "done" | "error"; text: string } | null>(null);
  async function save() {
    const parsed = notificationPreferencesSchema.safeParse(value);
    if (!parsed.success) return setState({ tone: "error", text: parsed.error.issues[0].message });
    try {
      await apiFetch("/api/notifications/preferences", { method: "PUT", body: parsed.data });
      setState({ tone: "done", text: "Saved." });
    } catch (error) {
      setState({ tone: "error", text: error instanceof ApiError ? error.message : "Not saved. Try again." });
    }
  }
  return (
    <form
      aria-label="Notification mail"
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        void save();
      }}
    >
      <label className="flex items-center gap-2 font-medium">
        <input type="checkbox" checked={value.emailEnabled} onChange={(e) => setValue({ ...value, emailEnabled: e.target.checked })} />
        Send notifications by e-mail
      </label>
      <ul className="space-y-1 pl-6 text-sm">
        {NOTIFICATION_KINDS.map((kind) => (
          <li key={kind}>
            <label className={`flex items-center gap-2 ${value.emailEnabled ? "" : "text-ink-soft"}`}>
              <input
                type="checkbox"
                disabled={!value.emailEnabled}
                checked={value.email[kind] !== false}
                onChange={(e) => setValue({ ...value, email: { ...value.email, [kind]: e.target.checked } })}
              />
              {NOTIFICATION_KIND_LABELS[kind]}
            </label>
          </li>
        ))}
      </ul>
      {state ? (
        <p role="status" className={`text-sm ${state.tone === "error" ? "text-caution" : "text-trace"}`}>
          {state.text}
        </p>
      ) : null}
      <button type="submit" className={primaryButton}>
        Save mail choices
      </button>
    </form>
  );
}
