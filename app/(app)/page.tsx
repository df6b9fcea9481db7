import { redirect } from "next/navigation";
import { requirePageActor } from "@/lib/auth/session";

// Each role lands where its work is.
export default async function Home() {
  const actor = await requirePageActor();
  if (actor.role === "admin") redirect("/admin/users");
  if (actor.role === "operator") redirect("/my-work");
  redirect("/issues");
}
