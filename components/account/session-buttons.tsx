"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { mutateRemote } from "@/lib/client/remote-data";

export function SessionButtons() {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  async function post(path: string) {
    const res = await fetch(path, { method: "POST", credentials: "same-origin" });
    if (!res.ok) return setMessage("That didn't work. Please try again.");
    await mutateRemote("/api/me", null, { revalidate: false });
    router.push("/sign-in");
    router.refresh();
  }
  return (
    <div className="flex flex-wrap gap-3">
      <button type="button" onClick={() => post("/api/account/sign-out")} className="min-h-11 rounded-md border border-border px-4 font-semibold hover:bg-surface-sunken">
        Sign out on this device
      </button>
      <button type="button" onClick={() => post("/api/account/sign-out-everywhere")} className="min-h-11 rounded-md border border-danger px-4 font-semibold text-danger hover:bg-danger-soft">
        Sign out everywhere
      </button>
      {message && <p role="alert">{message}</p>}
    </div>
  );
}
