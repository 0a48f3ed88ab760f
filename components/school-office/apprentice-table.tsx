import { Select } from "@/components/ui/select";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";
import type { ClassOfficeDto } from "@/lib/dto/school-office";
import { OfficeActionForm, type OfficeAction } from "./office-action-form";
import { SortHeader } from "./sort-header";

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/** Each apprentice's lessons and best quiz scores, sortable by any column, with the seat actions. */
export function ApprenticeTable({ office, reclaim, move }: { office: ClassOfficeDto; reclaim: OfficeAction; move: OfficeAction }) {
  const base = `/school/classes/${office.classId}`;
  const header = (label: string, key: Parameters<typeof SortHeader>[0]["sortKey"], numeric?: boolean) => (
    <SortHeader label={label} sortKey={key} current={office.sort} basePath={base} numeric={numeric} />
  );
  return (
    <Table caption={`Apprentices of ${office.name}: lessons completed and best quiz scores`} data-testid="office-apprentices">
      <TableHead>
        <TableRow>
          {header("Name", "name")}
          {header("E-mail", "email")}
          {header("Lessons", "progress", true)}
          {header("Last opened", "last-active")}
          {office.quizzes.map((q) => (
            <SortHeader key={q.bankId} label={q.title} sortKey={`quiz:${q.bankId}`} current={office.sort} basePath={base} numeric />
          ))}
          <TableHeaderCell>Seat</TableHeaderCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {office.apprentices.map((a) => (
          <TableRow key={a.userId}>
            <TableHeaderCell scope="row">{a.name}</TableHeaderCell>
            <TableCell className="min-w-56 break-all">{a.email}</TableCell>
            <TableCell numeric>
              {a.completedLessons}/{a.totalLessons} <span className="text-ink-muted">({a.percent}%)</span>
            </TableCell>
            <TableCell className="whitespace-nowrap">{a.lastViewedAt ? dateFormat.format(new Date(a.lastViewedAt)) : "Not yet"}</TableCell>
            {office.quizzes.map((q) => (
              <TableCell key={q.bankId} numeric>
                {a.bestByBank[q.bankId] === undefined ? <span className="text-ink-muted">–</span> : `${a.bestByBank[q.bankId]}%`}
              </TableCell>
            ))}
            <TableCell className="relative min-w-56">
              <SeatActions office={office} apprentice={a} reclaim={reclaim} move={move} />
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}

function SeatActions({ office, apprentice, reclaim, move }: { office: ClassOfficeDto; apprentice: ClassOfficeDto["apprentices"][number]; reclaim: OfficeAction; move: OfficeAction }) {
  const selectId = `move-${apprentice.userId}`;
  return (
    <div className="flex flex-col gap-3">
      {apprentice.started ? (
        <p className="text-body-sm text-ink-muted">Started: the seat stays theirs.</p>
      ) : (
        <OfficeActionForm action={reclaim} hidden={{ classId: office.classId, userId: apprentice.userId }} submitLabel={<>Reclaim seat<span className="sr-only"> of {apprentice.name}</span></>} testId="reclaim-form" />
      )}
      {office.siblingClasses.length > 0 && (
        <OfficeActionForm action={move} hidden={{ fromClassId: office.classId, userId: apprentice.userId }} submitLabel={<>Move<span className="sr-only"> {apprentice.name}</span></>}>
          <div className="flex flex-col gap-1">
            <label htmlFor={selectId} className="text-body-sm">
              Move with their seat to
            </label>
            <Select id={selectId} name="toClassId">
              {office.siblingClasses.map((c) => (
                <option key={c.classId} value={c.classId}>
                  {c.name} ({c.term})
                </option>
              ))}
            </Select>
          </div>
        </OfficeActionForm>
      )}
    </div>
  );
}
