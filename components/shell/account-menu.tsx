"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useRemoteData } from "@/lib/client/remote-data";
import { ROLE_LABEL, ROLE_NAV, type NavRole } from "./nav-links";

type Me = { id: string; name: string; email: string; role: NavRole };

async function fetchMe(url: string): Promise<Me | null> {
  const res = await fetch(url, { credentials: "same-origin", cache: "no-store" });
  if (!res.ok) throw new Error(`me: ${res.status}`);
  return ((await res.json()) as { me: Me | null }).me;
}

/** The signed-in part of the header, read from /api/me so the header itself can stay static. */
export function AccountMenu() {
  const router = useRouter();
  const { data: me, isLoading, mutate } = useRemoteData("/api/me", fetchMe, { revalidateOnFocus: true });

  if (isLoading) return <span className="inline-block h-9 w-40 animate-pulse rounded-md bg-surface-sunken" aria-hidden="true" />;
  if (!me)
    return (
      <div className="flex items-center gap-2">
        <Link href="/sign-in" className="inline-flex min-h-10 items-center rounded-md px-3 font-semibold text-ink underline-offset-4 hover:underline">
          Sign in
        </Link>
        <Link href="/sign-up" className="inline-flex min-h-10 items-center rounded-md bg-accent px-3 font-semibold text-accent-ink hover:bg-accent-hover">
          Create account
        </Link>
      </div>
    );

  async function signOut() {
    await fetch("/api/account/sign-out", { method: "POST", credentials: "same-origin" });
    await mutate(null, { revalidate: false });
    router.push("/");
    router.refresh();
  }

  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
      <nav aria-label="Your areas">
        <ul className="flex flex-wrap gap-1">
          {ROLE_NAV[me.role].map((l) => (
            <li key={l.href}>
              <Link href={l.href} className="inline-flex min-h-10 items-center rounded-md px-2 text-ink underline-offset-4 hover:underline">
                {l.label}
              </Link>
            </li>
          ))}
        </ul>
      </nav>
      <Link href="/account" className="inline-flex min-h-10 items-center gap-2 rounded-md px-2 text-sm text-ink-muted hover:text-ink">
        <span data-testid="me-name" className="font-semibold text-ink">{me.name}</span>
        <span className="rounded-full border border-border px-2 py-0.5 text-xs">{ROLE_LABEL[me.role]}</span>
      </Link>
      <button type="button" onClick={signOut} className="inline-flex min-h-10 items-center rounded-md border border-border px-3 text-sm font-semibold text-ink hover:bg-surface-sunken">
        Sign out
      </button>
    </div>
  );
}
