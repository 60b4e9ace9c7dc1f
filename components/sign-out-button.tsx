"use client";

export function SignOutButton({ className }: { className?: string }) {
  return (
    <button
      type="button"
      className={className}
      // Loaded on click: next-auth's client is needed for this one action, not on every signed-in page.
      onClick={async () => (await import("next-auth/react")).signOut({ callbackUrl: "/" })}
    >
      Sign out
    </button>
  );
}
