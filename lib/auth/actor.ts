// The acting user as every service receives it: who, in which organization,
// with which role. Built from the session (web) or from an API key (public API).
import { AppError } from "@/lib/errors";
import { can, type Capability, type Role } from "./roles";

export interface Actor {
  userId: number | null;
  organizationId: number;
  role: Role;
  /** Set when the actor is an organization API key rather than a person. */
  apiKeyId?: number;
}

export function requireCapability(actor: Actor | null | undefined, capability: Capability): Actor {
  if (!actor) throw new AppError("unauthenticated", "Please sign in");
  if (!can(actor.role, capability)) throw new AppError("forbidden", "Your role does not allow this");
  return actor;
}
