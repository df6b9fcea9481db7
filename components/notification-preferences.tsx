"use client";
// The person's e-mail choices (assigned to me, resolved, daily digest),
// read and saved through /api/notifications/preferences.
import { useEffect, useState } from "react";

type Prefs = { email: { assigned: boolean; resolved: boolean; digest: boolean } };
const LABELS: Record<keyof Prefs["email"], string> = {
  assigned: "An issue is assigned to me",
  resolved: "An operator resolves an issue I assigned",
  digest: "Daily digest of new and recurred issues (engineers)",
};

export function NotificationPreferences() {
  const [prefs, setPrefs] = useState<Prefs | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  useEffect(() => {
    void fetch("/api/notifications/preferences", { cache: "no-store" }).then(async (r) => r.ok && setPrefs((await r.json()) as Prefs));
  }, []);
  const save = async (next: Prefs) => {
    setPrefs(next);
    const r = await fetch("/api/notifications/preferences", { method: "PUT", headers: { "Content-Type": "application/json" }, body: JSON.stringify(next) });
    setMessage(r.ok ? "Saved" : "Could not save; try again");
  };
  return (
    <section className="rounded border border-line bg-paper-raised p-4" aria-labelledby="notif-h">
      <h2 id="notif-h" className="mb-2 text-sm font-semibold">E-mail notifications</h2>
      {!prefs ? <p className="text-xs text-ink-soft">Loading…</p> : (
        <fieldset className="space-y-2">
          <legend className="mb-1 text-xs text-ink-soft">Send me an e-mail when…</legend>
          {(Object.keys(LABELS) as (keyof Prefs["email"])[]).map((k) => (
            <label key={k} className="flex items-center gap-2 text-sm">
              <input type="checkbox" className="h-4 w-4" checked={prefs.email[k]} onChange={(e) => void save({ email: { ...prefs.email, [k]: e.target.checked } })} />
              {LABELS[k]}
            </label>
          ))}
        </fieldset>
      )}
      {message && <p role="status" className="mt-2 text-xs text-ink-soft">{message}</p>}
    </section>
  );
}
