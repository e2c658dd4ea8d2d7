"use client";

import { signOut } from "next-auth/react";
import { useState } from "react";
import { Button, type ButtonProps } from "@/components/ui/button";
import { forgetPhonePages } from "@/components/offline/phone-pages";

/** Signs out on this device and goes to the home page. */
export function SignOutButton(props: Omit<ButtonProps, "onClick" | "loading">) {
  const [working, setWorking] = useState(false);
  return (
    <Button
      variant="secondary"
      {...props}
      loading={working}
      onClick={async () => {
        setWorking(true);
        await forgetPhonePages();
        await signOut({ callbackUrl: "/" });
      }}
    >
      {props.children ?? "Sign out"}
    </Button>
  );
}
