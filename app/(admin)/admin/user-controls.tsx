"use client";
import { useActionState } from "react";
import { changeRoleAction, setStatusAction, type ActionState } from "./actions";

const ROLES = [
  ["apprentice", "Apprentice"],
  ["instructor", "Instructor"],
  ["school_manager", "School manager"],
  ["admin", "Admin"],
] as const;

export function UserControls({ userId, name, role, status }: { userId: string; name: string; role: string; status: string }) {
  const [roleState, roleAction, rolePending] = useActionState<ActionState, FormData>(changeRoleAction, null);
  const [statusState, statusAction, statusPending] = useActionState<ActionState, FormData>(setStatusAction, null);
  const message = roleState ?? statusState;
  return (
    <div className="flex flex-wrap items-center gap-2">
      <form action={roleAction} className="flex items-center gap-2">
        <input type="hidden" name="userId" value={userId} />
        <label className="sr-only" htmlFor={`role-${userId}`}>Role of {name}</label>
        <select id={`role-${userId}`} name="role" defaultValue={role} className="min-h-10 rounded-md border border-border bg-surface-raised px-2 text-ink">
          {ROLES.map(([value, label]) => (
            <option key={value} value={value}>{label}</option>
          ))}
        </select>
        <button type="submit" disabled={rolePending} className="min-h-10 rounded-md border border-border px-3 text-sm font-semibold hover:bg-surface-sunken">
          Change role<span className="sr-only"> of {name}</span>
        </button>
      </form>
      <form action={statusAction}>
        <input type="hidden" name="userId" value={userId} />
        <input type="hidden" name="status" value={status === "active" ? "disabled" : "active"} />
        <button type="submit" disabled={statusPending} className="min-h-10 rounded-md border border-border px-3 text-sm font-semibold hover:bg-surface-sunken">
          {status === "active" ? "Disable" : "Re-enable"}<span className="sr-only"> {name}</span>
        </button>
      </form>
      {message && (
        <p role="status" className={message.ok ? "text-sm text-ink" : "text-sm font-semibold text-danger"}>
          {message.message}
        </p>
      )}
    </div>
  );
}
