import { Badge } from "@/components/ui/badge";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";
import type { PendingInvitationDto } from "@/lib/dto/school-office";
import { OfficeActionForm, type OfficeAction } from "./office-action-form";

const dayFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/** Invitations nobody has accepted yet, each with its withdraw button. */
export function InvitationTable({ classId, invitations, revoke }: { classId: string; invitations: PendingInvitationDto[]; revoke: OfficeAction }) {
  if (invitations.length === 0) return <p className="text-ink-muted">No invitations are waiting for an answer.</p>;
  return (
    <Table caption="Invitations waiting for an answer" captionHidden data-testid="pending-invitations">
      <TableHead>
        <TableRow>
          <TableHeaderCell>E-mail</TableHeaderCell>
          <TableHeaderCell>Name</TableHeaderCell>
          <TableHeaderCell>Sent (UTC)</TableHeaderCell>
          <TableHeaderCell>Open until (UTC)</TableHeaderCell>
          <TableHeaderCell>Action</TableHeaderCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {invitations.map((i) => (
          <TableRow key={i.id}>
            <TableHeaderCell scope="row" className="min-w-56 break-all">
              {i.email}
            </TableHeaderCell>
            <TableCell>{i.name ?? <span className="text-ink-muted">–</span>}</TableCell>
            <TableCell className="whitespace-nowrap">{dayFormat.format(new Date(i.invitedAt))}</TableCell>
            <TableCell className="whitespace-nowrap">
              {i.expired ? (
                <Badge tone="caution" withIcon>
                  Expired {dayFormat.format(new Date(i.expiresAt))}
                </Badge>
              ) : (
                dayFormat.format(new Date(i.expiresAt))
              )}
            </TableCell>
            <TableCell className="relative min-w-48">
              <OfficeActionForm action={revoke} hidden={{ classId, invitationId: i.id }} submitLabel={<>Withdraw<span className="sr-only"> the invitation to {i.email}</span></>} testId="revoke-form" />
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
