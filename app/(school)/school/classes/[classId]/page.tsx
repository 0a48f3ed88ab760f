import type { Metadata } from "next";
import Link from "next/link";
import { ApprenticeTable } from "@/components/school-office/apprentice-table";
import { InvitationTable } from "@/components/school-office/invitation-table";
import { InviteForm } from "@/components/school-office/invite-form";
import { OfficeActionForm } from "@/components/school-office/office-action-form";
import { SeatSummary } from "@/components/school-office/seat-summary";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { getClassOffice, parseSort } from "@/lib/server/school-office";
import { assignInstructorAction, inviteAction, moveApprenticeAction, moveSeatsAction, reclaimAction, revokeAction } from "./actions";

export const metadata: Metadata = { title: "Class: seats and apprentices" };

type Search = { sort?: string | string[]; dir?: string | string[] };

export default async function ClassOfficePage({ params, searchParams }: { params: Promise<{ classId: string }>; searchParams: Promise<Search> }) {
  const { classId } = await params;
  const search = await searchParams;
  const viewer = await requirePageViewer(`/school/classes/${classId}`, "school_manager");
  // Another school's class, or no such class: the same 404, so ids can't be probed.
  const { office } = pageData(await getClassOffice(viewer, classId, parseSort(search.sort, search.dir)));
  const h = (id: string, text: string) => (
    <h2 id={id} className="text-title-2">
      {text}
    </h2>
  );
  return (
    <div className="space-y-10">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/school">School office</Link> <span aria-hidden="true">›</span> <span aria-current="page">{office.name}</span>
      </nav>
      <header className="space-y-2">
        <h1 className="text-3xl font-bold">{office.name}</h1>
        <p className="text-ink-muted">
          {office.schoolName} · {office.term} · Course: <Link href={`/courses/${office.courseSlug}`}>{office.courseTitle}</Link>
        </p>
        <nav aria-label="For this class" className="flex flex-wrap gap-x-5 gap-y-2 text-body-sm">
          <Link href={`/school/buy?class=${office.classId}`}>Buy seats for this class</Link>
          <Link href="/school/orders">Orders and refunds</Link>
          <Link href={`/school/classes/${office.classId}/roster.csv?sort=${encodeURIComponent(office.sort.key)}&dir=${office.sort.dir}`} prefetch={false} download>
            Download the apprentice table (CSV)
          </Link>
        </nav>
      </header>

      <section aria-labelledby="seats" className="space-y-3">
        {h("seats", "Seats")}
        <SeatSummary seats={office.seats} />
      </section>

      <section aria-labelledby="invite" className="space-y-3">
        {h("invite", "Invite apprentices")}
        <InviteForm action={inviteAction} classId={office.classId} freeSeats={office.seats.free} />
      </section>

      <section aria-labelledby="pending" className="space-y-3">
        {h("pending", `Invitations waiting for an answer (${office.invitations.length})`)}
        <InvitationTable classId={office.classId} invitations={office.invitations} revoke={revokeAction} />
      </section>

      <section aria-labelledby="apprentices" className="space-y-3" id="apprentices-section">
        <h2 id="apprentices" className="text-title-2">
          Apprentices ({office.apprentices.length})
        </h2>
        {office.apprentices.length === 0 ? (
          <p className="text-ink-muted">Nobody has taken a seat yet. Invitations appear here once accepted.</p>
        ) : (
          <>
            <p className="text-body-sm text-ink-muted">Choose a column heading to sort. A seat can be reclaimed until its apprentice opens a lesson or starts a quiz.</p>
            <ApprenticeTable office={office} reclaim={reclaimAction} move={moveApprenticeAction} />
          </>
        )}
      </section>

      <section aria-labelledby="staff" className="space-y-3">
        {h("staff", "Instructor")}
        <p>{office.instructors.length > 0 ? `Taught by ${office.instructors.map((i) => i.name).join(", ")}.` : "No instructor yet."}</p>
        {office.instructorChoices.length > 0 ? (
          <OfficeActionForm action={assignInstructorAction} hidden={{ classId: office.classId }} submitLabel="Assign" testId="assign-form">
            <div className="flex min-w-56 flex-col gap-1.5">
              <label htmlFor="instructor" className="font-semibold">
                Instructor of this class
              </label>
              <Select id="instructor" name="userId" defaultValue={office.instructors[0]?.userId ?? ""}>
                <option value="" disabled>
                  Choose an instructor…
                </option>
                {office.instructorChoices.map((i) => (
                  <option key={i.userId} value={i.userId}>
                    {i.name}
                  </option>
                ))}
              </Select>
            </div>
          </OfficeActionForm>
        ) : (
          <p className="text-ink-muted">Your school has no instructors yet.</p>
        )}
      </section>

      {office.siblingClasses.length > 0 && (
        <section aria-labelledby="move" className="space-y-3">
          {h("move", "Move free seats")}
          <p className="text-body-sm text-ink-muted">Seats nobody has taken and no invitation holds can go to another class of the same course.</p>
          <OfficeActionForm action={moveSeatsAction} hidden={{ fromClassId: office.classId }} submitLabel="Move seats" testId="move-seats-form">
            <div className="flex w-32 flex-col gap-1.5">
              <label htmlFor="move-count" className="font-semibold">
                Seats
              </label>
              <Input id="move-count" name="count" inputMode="numeric" defaultValue="1" />
            </div>
            <div className="flex min-w-56 flex-col gap-1.5">
              <label htmlFor="move-to" className="font-semibold">
                To the class
              </label>
              <Select id="move-to" name="toClassId">
                {office.siblingClasses.map((c) => (
                  <option key={c.classId} value={c.classId}>
                    {c.name} ({c.free} free)
                  </option>
                ))}
              </Select>
            </div>
          </OfficeActionForm>
        </section>
      )}
    </div>
  );
}
