"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { cx } from "@/components/ui/cx";
import { useRemoteData } from "@/lib/client/remote-data";
import { ROLE_LABEL, ROLE_NAV, type NavRole } from "./nav-links";

type Me = { id: string; name: string; email: string; role: NavRole };

async function fetchMe(url: string): Promise<Me | null> {
  const res = await fetch(url, { credentials: "same-origin", cache: "no-store" });
  if (!res.ok) throw new Error(`me: ${res.status}`);
  return ((await res.json()) as { me: Me | null }).me;
}

/** Who is signed in, from /api/me, so the header itself can stay static; both parts below share one request. */
function useMe() {
  return useRemoteData("/api/me", fetchMe, { revalidateOnFocus: true });
}

/**
 * The role's links. Nothing while /api/me is on its way or for a visitor: from lg up the header's
 * second row keeps its height from the account part beside it, so nothing moves when the answer comes.
 */
export function RoleNav({ className }: { className?: string }) {
  const { data: me } = useMe();
  if (!me) return null;
  return (
    <nav aria-label="Your areas" className={className}>
      <ul className="grid grid-cols-2 gap-1 lg:flex lg:flex-wrap">
        {ROLE_NAV[me.role].map((l) => (
          <li key={l.href}>
            <Link href={l.href} className="inline-flex min-h-10 items-center rounded-md px-2 text-ink underline-offset-4 hover:underline">
              {l.label}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}

/** The account part: the name (a link to /account) and sign-out, or sign-in and sign-up; always 40 px high. */
export function AccountLinks({ className }: { className?: string }) {
  const router = useRouter();
  const { data: me, isLoading, mutate } = useMe();

  if (isLoading)
    return (
      <div className={cx("flex min-h-10 items-center", className)}>
        <span className="inline-block h-9 w-40 animate-pulse rounded-md bg-surface-sunken" aria-hidden="true" />
      </div>
    );
  if (!me)
    return (
      <div className={cx("flex min-h-10 items-center gap-2", className)}>
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
    <div className={cx("flex min-h-10 min-w-0 items-center gap-3", className)}>
      <Link href="/account" className="inline-flex min-h-10 min-w-0 items-center gap-2 rounded-md px-2 text-sm text-ink-muted hover:text-ink">
        <span data-testid="me-name" className="truncate font-semibold text-ink">
          {me.name}
        </span>
        <span className="shrink-0 rounded-full border border-border px-2 py-0.5 text-xs">{ROLE_LABEL[me.role]}</span>
      </Link>
      <button type="button" onClick={signOut} className="inline-flex min-h-10 shrink-0 items-center rounded-md border border-border px-3 text-sm font-semibold text-ink hover:bg-surface-sunken">
        Sign out
      </button>
    </div>
  );
}
