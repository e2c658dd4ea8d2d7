"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { FormAlert } from "@/components/auth/form-alert";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import type { Role } from "@/lib/auth/role-list";
import { changeUserRole } from "./actions";

export type UserRow = {
  id: string;
  email: string;
  name: string;
  company: string | null;
  role: Role;
  emailVerified: boolean;
  /** ISO date the account opened. */
  createdAt: string;
};

export type UserListProps = { users: UserRow[]; currentUserId: string };

const ROLE_LABEL: Record<Role, string> = { builder: "Builder", subscriber: "Subscriber", admin: "Admin" };
const ROLE_LOOK: Record<Role, string> = {
  builder: "border-rule-strong bg-paper-sunk text-ink",
  subscriber: "border-spruce bg-spruce-light text-spruce-dark",
  admin: "border-amber-dark bg-amber-light text-ink",
};

type Pending = { user: UserRow; to: "builder" | "admin" };

/** The accounts as cards (they read on a phone), each with the one role change an admin may make. */
export function UserList({ users, currentUserId }: UserListProps) {
  const router = useRouter();
  const [pending, setPending] = useState<Pending | null>(null);
  const [message, setMessage] = useState<{ tone: "done" | "error"; text: string } | null>(null);
  const [working, startTransition] = useTransition();

  function confirm() {
    if (!pending) return;
    const { user, to } = pending;
    startTransition(async () => {
      const result = await changeUserRole({ userId: user.id, role: to }).catch(() => null);
      setPending(null);
      if (!result) return setMessage({ tone: "error", text: "No connection; nothing was changed. Try again." });
      if (!result.ok) return setMessage({ tone: "error", text: `Not changed: ${result.error}.` });
      setMessage({ tone: "done", text: `${user.email} is now ${to === "admin" ? "an admin" : "a builder"}.` });
      router.refresh();
    });
  }

  return (
    <>
      {message ? (
        <FormAlert tone={message.tone} className="mb-3">
          {message.text}
        </FormAlert>
      ) : null}
      <ul className="flex flex-col gap-3" data-testid="user-list">
        {users.map((user) => (
          <li key={user.id} className="flex flex-col gap-3 rounded-card border-2 border-rule bg-paper-raised p-4 md:flex-row md:items-center">
            <div className="min-w-0 flex-1">
              <p className="font-bold break-all">{user.email}</p>
              <p className="text-ink-soft">
                {user.name}
                {user.company ? ` · ${user.company}` : ""}
              </p>
              <p className="mt-1 flex flex-wrap items-center gap-2 text-sm">
                <span className={`rounded-full border-2 px-2 font-bold ${ROLE_LOOK[user.role]}`}>{ROLE_LABEL[user.role]}</span>
                <span className="text-graphite">{user.emailVerified ? "E-mail confirmed" : "E-mail not confirmed"}</span>
                <span className="text-graphite">Opened {user.createdAt.slice(0, 10)}</span>
              </p>
            </div>
            <div className="md:w-56 md:text-right">
              {user.id === currentUserId ? (
                <p className="text-sm text-graphite">Your own account: another admin can change its role.</p>
              ) : user.role === "subscriber" ? (
                <p className="text-sm text-graphite">Subscriber: set by payments, not here.</p>
              ) : user.role === "admin" ? (
                <Button variant="secondary" fullWidth onClick={() => setPending({ user, to: "builder" })}>
                  Remove admin
                </Button>
              ) : (
                <Button variant="secondary" fullWidth onClick={() => setPending({ user, to: "admin" })}>
                  Make admin
                </Button>
              )}
            </div>
          </li>
        ))}
      </ul>
      <Dialog
        open={pending !== null}
        onClose={() => setPending(null)}
        title={pending?.to === "admin" ? "Make this account an admin?" : "Remove the admin role?"}
        description={
          pending?.to === "admin"
            ? `${pending.user.email} will be able to change the material tables every answer uses, and other accounts' roles.`
            : `${pending?.user.email ?? ""} goes back to a builder account and loses the admin area at once.`
        }
        actions={
          <>
            <Button variant="secondary" onClick={() => setPending(null)} disabled={working}>
              Keep as it is
            </Button>
            <Button variant={pending?.to === "admin" ? "primary" : "danger"} loading={working} onClick={confirm}>
              {pending?.to === "admin" ? "Make admin" : "Remove admin"}
            </Button>
          </>
        }
      />
    </>
  );
}
