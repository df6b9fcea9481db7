"use client";
// Unread notifications in the shell: polls /api/notifications every 30 s,
// opens a short list, marks read on open. No query provider needed here.
import { useCallback, useEffect, useRef, useState } from "react";
import Link from "next/link";

interface Item { id: number; title: string; body: string; link: string | null; createdAt: string; isRead: boolean }
const POLL_MS = 30_000;

export function NotificationBell() {
  const [unread, setUnread] = useState(0);
  const [items, setItems] = useState<Item[]>([]);
  const [isOpen, setOpen] = useState(false);
  const box = useRef<HTMLDivElement>(null);

  const load = useCallback(async () => {
    try {
      const res = await fetch("/api/notifications", { cache: "no-store" });
      if (!res.ok) return;
      const body = (await res.json()) as { unread: number; items: Item[] };
      setUnread(body.unread);
      setItems(body.items);
    } catch {
      // Offline for a moment: keep the last count.
    }
  }, []);

  useEffect(() => {
    const first = setTimeout(() => void load(), 0); // first poll right after mount, outside the effect body
    const t = setInterval(() => void load(), POLL_MS);
    return () => { clearTimeout(first); clearInterval(t); };
  }, [load]);

  useEffect(() => {
    if (!isOpen) return;
    const close = (e: MouseEvent) => { if (box.current && !box.current.contains(e.target as Node)) setOpen(false); };
    document.addEventListener("click", close);
    return () => document.removeEventListener("click", close);
  }, [isOpen]);

  const open = async () => {
    setOpen((o) => !o);
    if (!isOpen && unread > 0) {
      await fetch("/api/notifications/read", { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify({ all: true }) }).catch(() => undefined);
      setUnread(0);
    }
  };

  return (
    <div className="relative" ref={box}>
      <button type="button" onClick={() => void open()} aria-expanded={isOpen} aria-label={`Notifications, ${unread} unread`} data-testid="notification-bell"
        className="relative min-h-8 rounded px-2 py-1 text-ink-soft hover:text-ink">
        <svg aria-hidden="true" viewBox="0 0 20 20" width="16" height="16" fill="currentColor"><path d="M10 2a5 5 0 0 0-5 5v3.3L3.4 13a.7.7 0 0 0 .6 1.1h12a.7.7 0 0 0 .6-1.1L15 10.3V7a5 5 0 0 0-5-5Zm0 16a2.3 2.3 0 0 0 2.2-1.6H7.8A2.3 2.3 0 0 0 10 18Z" /></svg>
        {unread > 0 && <span className="absolute -right-1 -top-1 rounded-full bg-bad px-1 text-[10px] font-semibold leading-4 text-paper" data-testid="notification-count">{unread > 99 ? "99+" : unread}</span>}
      </button>
      {isOpen && (
        <div className="absolute right-0 z-20 mt-1 w-80 max-w-[90vw] rounded border border-line bg-paper-raised p-2 shadow-lg">
          {items.length === 0 && <p className="p-2 text-sm text-ink-soft">No notifications.</p>}
          <ul className="max-h-96 space-y-1 overflow-y-auto">
            {items.map((n) => (
              <li key={n.id} className={`rounded p-2 text-sm ${n.isRead ? "" : "bg-copper-light/50"}`}>
                {n.link ? <Link href={n.link} className="font-medium text-ink hover:underline" onClick={() => setOpen(false)}>{n.title}</Link> : <span className="font-medium">{n.title}</span>}
                {n.body && <p className="line-clamp-2 whitespace-pre-line text-xs text-ink-soft">{n.body}</p>}
                <p className="text-[10px] text-ink-faint">{new Date(n.createdAt).toLocaleString()}</p>
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}
