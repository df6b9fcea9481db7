import Link from "next/link";
import { Wordmark } from "./logo";
import { can, ROLE_LABEL, type Role } from "@/lib/auth/roles";
import { SignOutButton } from "./sign-out-button";
import { NotificationBell } from "./notification-bell";

interface NavItem { href: string; label: string; show: (r: Role) => boolean }

// One list; each role sees the links its capabilities allow.
const ITEMS: NavItem[] = [
  { href: "/issues", label: "Issues", show: (r) => can(r, "issues.read") && r !== "operator" },
  { href: "/my-work", label: "My work", show: (r) => r === "operator" },
  { href: "/wells", label: "Wells", show: (r) => can(r, "wells.read") },
  { href: "/uploads", label: "Uploads", show: (r) => can(r, "uploads.read") },
  { href: "/rules", label: "Rule settings", show: (r) => can(r, "rules.edit") },
  { href: "/admin/users", label: "People", show: (r) => can(r, "users.manage") },
  { href: "/admin/api-keys", label: "API keys", show: (r) => can(r, "apikeys.manage") },
  { href: "/api-docs", label: "API", show: (r) => can(r, "uploads.create") },
];

export function AppNav({ role, name, orgName }: { role: Role; name: string; orgName: string }) {
  return (
    <header className="border-b border-line bg-paper-raised">
      <div className="mx-auto flex max-w-screen-2xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2">
        <Link href="/" aria-label="Bellows home"><Wordmark /></Link>
        <nav aria-label="Main" className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
          {ITEMS.filter((i) => i.show(role)).map((i) => (
            <Link key={i.href} href={i.href} className="text-ink-soft hover:text-ink">{i.label}</Link>
          ))}
        </nav>
        <div className="ml-auto flex items-center gap-3 text-xs text-ink-soft">
          <NotificationBell />
          <Link href="/settings" className="hover:text-ink" data-testid="whoami">
            {name} · {ROLE_LABEL[role]} · {orgName}
          </Link>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
