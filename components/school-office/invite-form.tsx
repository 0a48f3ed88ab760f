"use client";
// Invite apprentices into a class: typed addresses or a CSV file, and the explicit choice to send
// the good lines only. The server answers with a sentence and each refused line with its number.
import { useActionState, useId, useState } from "react";
import { Checkbox } from "@/components/ui/checkbox";
import { FormField } from "@/components/ui/form-field";
import { Notice } from "@/components/ui/notice";
import { SubmitButton } from "@/components/ui/submit-button";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";
import { Textarea } from "@/components/ui/textarea";
import type { InviteFormState } from "@/lib/dto/school-office";

export type InviteAction = (state: InviteFormState, form: FormData) => Promise<InviteFormState>;

const MAX_FILE_BYTES = 64 * 1024; // the server's MAX_ROSTER_BYTES, checked here first to spare an upload

export function InviteForm({ action, classId, freeSeats }: { action: InviteAction; classId: string; freeSeats: number }) {
  const [state, formAction] = useActionState(action, { ok: false, message: null });
  const [fileProblem, setFileProblem] = useState<string | null>(null);
  const base = `invite-${useId()}`;
  return (
    <form action={formAction} className="flex flex-col gap-5" data-testid="invite-form">
      <input type="hidden" name="classId" value={classId} />
      <p className="text-body-sm text-ink-muted">
        {freeSeats === 1 ? "1 seat is free." : `${freeSeats} seats are free.`} Each invitation holds a seat for 7 days, until it is accepted or you withdraw it.
      </p>
      <FormField label="E-mail addresses" name="addresses" hint="One per line, as name@example.com or Robin Pike <name@example.com>.">
        {(control) => <Textarea rows={5} autoComplete="off" spellCheck={false} {...control} />}
      </FormField>
      <div className="flex flex-col gap-1.5">
        <label htmlFor={`${base}-file`} className="font-semibold">
          Or a CSV roster
        </label>
        <p id={`${base}-file-hint`} className="text-body-sm text-ink-muted">
          A header row with an <code>email</code> column and, if you like, a <code>name</code> column; at most 200 people and 64 KB.
        </p>
        <input
          id={`${base}-file`}
          name="csv"
          type="file"
          accept=".csv,text/csv"
          aria-describedby={`${base}-file-hint`}
          className="min-h-target text-body-sm file:mr-3 file:min-h-target file:rounded-control file:border file:border-border file:bg-surface-raised file:px-3"
          onChange={(e) => setFileProblem((e.currentTarget.files?.[0]?.size ?? 0) > MAX_FILE_BYTES ? "That file is larger than 64 KB. Split the roster into smaller files." : null)}
        />
        {fileProblem && (
          <p role="alert" className="text-body-sm font-semibold text-danger">
            {fileProblem}
          </p>
        )}
      </div>
      <Checkbox name="goodRowsOnly" label="If some lines have problems, invite the good lines anyway" hint="Otherwise nothing is sent until every line is good." />
      <div>
        <SubmitButton loadingText="sending" disabled={fileProblem !== null}>
          Send invitations
        </SubmitButton>
      </div>
      {state.message && (
        <Notice tone={state.ok ? "success" : "danger"} announce label={state.ok ? "Sent" : "Not sent"}>
          <p>{state.message}</p>
        </Notice>
      )}
      {state.problems && state.problems.length > 0 && (
        <Table caption={state.ok ? "Lines skipped" : "Lines that need another look"} data-testid="roster-problems">
          <TableHead>
            <TableRow>
              <TableHeaderCell numeric>Line</TableHeaderCell>
              <TableHeaderCell>Problem</TableHeaderCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {state.problems.map((p) => (
              <TableRow key={`${p.line}-${p.email}-${p.problem}`}>
                <TableCell numeric>{p.line === 0 ? "all" : p.line}</TableCell>
                <TableCell className="break-words">{p.problem}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </form>
  );
}
