"use client";
// Comment and photo forms on the issue page.
import { useRef, useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { commentAction, photoAction } from "./actions";

export function IssueDiscussion({ issueId }: { issueId: number }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [isPending, start] = useTransition();
  const commentForm = useRef<HTMLFormElement>(null);
  const photoForm = useRef<HTMLFormElement>(null);
  const submit = (form: HTMLFormElement, fn: (f: FormData) => Promise<{ ok: boolean; message?: string }>, done: string) => {
    const f = new FormData(form);
    start(async () => {
      const r = await fn(f);
      setMessage(r.ok ? { ok: true, text: done } : { ok: false, text: (r as { message: string }).message });
      if (r.ok) { form.reset(); router.refresh(); }
    });
  };
  return (
    <div className="space-y-3">
      {message && <p role={message.ok ? "status" : "alert"} className={`text-sm ${message.ok ? "text-good" : "text-bad"}`}>{message.text}</p>}
      <form ref={commentForm} aria-label="Add a comment" className="space-y-2" onSubmit={(e) => { e.preventDefault(); submit(e.currentTarget, (f) => commentAction(issueId, f), "Comment added"); }}>
        <label htmlFor="comment-body" className="field-label">Comment</label>
        <textarea id="comment-body" name="body" rows={3} required maxLength={4000} className="field-input" />
        <button type="submit" disabled={isPending} className="min-h-11 rounded border border-line bg-paper-raised px-4 py-2 text-sm">Add comment</button>
      </form>
      <form ref={photoForm} aria-label="Add a photo" className="space-y-2" onSubmit={(e) => { e.preventDefault(); submit(e.currentTarget, (f) => photoAction(issueId, f), "Photo added"); }}>
        <label htmlFor="photo-file" className="field-label">Photo (JPEG, PNG or WebP, up to 5 MB)</label>
        <input id="photo-file" name="photo" type="file" accept="image/jpeg,image/png,image/webp" capture="environment" required className="block text-sm" />
        <button type="submit" disabled={isPending} className="min-h-11 rounded border border-line bg-paper-raised px-4 py-2 text-sm">Upload photo</button>
      </form>
    </div>
  );
}
