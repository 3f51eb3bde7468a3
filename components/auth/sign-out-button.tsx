"use client";
import { signOut } from "next-auth/react";

export interface SignOutButtonProps {
  className?: string;
  /** where to go afterwards (a same-site path); the sign-in page by default */
  callbackUrl?: string;
}

export function SignOutButton({ className = "btn-quiet", callbackUrl = "/sign-in" }: SignOutButtonProps) {
  return (
    <button type="button" className={className} onClick={() => void signOut({ callbackUrl })}>
      Sign out
    </button>
  );
}
