"use client";
import { signOut } from "next-auth/react";

export interface SignOutButtonProps {
  className?: string;
}

export function SignOutButton({ className = "btn-quiet" }: SignOutButtonProps) {
  return (
    <button type="button" className={className} onClick={() => void signOut({ callbackUrl: "/sign-in" })}>
      Sign out
    </button>
  );
}
