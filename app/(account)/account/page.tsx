import type { Metadata } from "next";
import { ChangePasswordForm } from "@/components/auth/change-password-form";
import { ProfileForm } from "@/components/auth/profile-form";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { Card, CardLink } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { userForPage } from "@/lib/auth/guard";
import type { Role } from "@/lib/auth/roles";

export const metadata: Metadata = { title: "Account" };
export const dynamic = "force-dynamic";

const ROLE_WORDS: Record<Role, { name: string; about: string }> = {
  builder: { name: "Builder (free)", about: "Size members, save jobs and share them. Subscribe for more." },
  subscriber: { name: "Subscriber", about: "Every paid feature is on. Manage the plan under Billing." },
  admin: { name: "Admin", about: "You manage the material tables and the accounts." },
};

export default async function AccountPage() {
  const user = await userForPage("/account");
  const role = ROLE_WORDS[user.role];
  return (
    <div className="flex flex-col gap-4 pb-8">
      <PageHeader title="Account" lead={`Signed in as ${user.name}.`} />

      <Card title="Sign-in e-mail">
        <p className="font-bold break-all" data-testid="account-email">
          {user.email}
        </p>
        <p className="mt-1 text-ink-soft">To use another address, open a new account with it.</p>
      </Card>

      <Card title="Name and company">
        <ProfileForm name={user.name} company={user.company} />
      </Card>

      <Card title="Plan">
        <p className="font-bold" data-testid="account-role">
          {role.name}
        </p>
        <p className="mt-1 text-ink-soft">{role.about}</p>
      </Card>

      <div className="flex flex-col gap-3">
        <CardLink href="/billing" title="Billing">
          Plan, renewal date and receipts
        </CardLink>
        {user.role === "admin" ? (
          <CardLink href="/admin" title="Admin">
            Accounts and material tables
          </CardLink>
        ) : null}
      </div>

      <Card title="Password">
        <ChangePasswordForm />
      </Card>

      <Card title="Sign out">
        <p className="mb-3 text-ink-soft">Signs out on this device only. Your jobs stay saved.</p>
        <SignOutButton fullWidth className="sm:w-auto">
          Sign out
        </SignOutButton>
      </Card>
    </div>
  );
}
