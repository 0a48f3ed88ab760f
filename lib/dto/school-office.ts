// What the school office shows (client-safe types: the forms and the table read them).
import type { Failure, FormState } from "./result";

/** One line of a roster that can't be invited as it stands. `line` 0 = the whole roster. */
export type RosterProblem = { line: number; email: string; problem: string };

/** A roster refused as a whole (nothing invited): the sentence and each line's problem. */
export type RosterRefusal = Failure & { problems?: RosterProblem[] };

/** The invite form's state: a sentence, and the lines that were refused or skipped. */
export type InviteFormState = FormState & { problems?: RosterProblem[]; invited?: number };

export type SeatPoolDto = { purchased: number; claimed: number; pendingInvitations: number; free: number };

export type PendingInvitationDto = { id: string; email: string; name: string | null; invitedAt: string; expiresAt: string; expired: boolean };

export type QuizColumnDto = { bankId: string; title: string };

export type OfficeApprenticeDto = {
  userId: string;
  name: string;
  email: string;
  joinedAt: string;
  completedLessons: number;
  totalLessons: number;
  percent: number;
  lastViewedAt: string | null;
  /** Best submitted score per bank (whole percent), null when never submitted. */
  bestByBank: Record<string, number | null>;
  /** Opened a lesson or started a quiz of the course: the seat can no longer be reclaimed. */
  started: boolean;
};

export type OfficeSortKey = "name" | "email" | "progress" | "last-active" | "joined" | `quiz:${string}`;

export type ClassOfficeDto = {
  classId: string;
  name: string;
  term: string;
  courseSlug: string;
  courseTitle: string;
  schoolName: string;
  seats: SeatPoolDto;
  invitations: PendingInvitationDto[];
  quizzes: QuizColumnDto[];
  apprentices: OfficeApprenticeDto[];
  sort: { key: OfficeSortKey; dir: "asc" | "desc" };
  instructors: { userId: string; name: string }[];
  /** The school's instructors (school role instructor): whom the class's instructor may be. */
  instructorChoices: { userId: string; name: string }[];
  /** Other classes of the school on the same course: where seats and apprentices can move. */
  siblingClasses: { classId: string; name: string; term: string; free: number }[];
};

export type OfficeClassSummaryDto = { id: string; name: string; term: string; courseSlug: string; courseTitle: string; seats: SeatPoolDto; apprentices: number };

export type OfficeSchoolDto = { schoolId: string; schoolName: string; classes: OfficeClassSummaryDto[] };

/** What the invitation page shows to whoever opens the link (nothing is consumed by looking). */
export type InvitationViewDto =
  | { state: "invalid" }
  | {
      state: "open";
      email: string;
      name: string | null;
      className: string;
      schoolName: string;
      courseTitle: string;
      expiresAt: string;
      /** Who is looking, and what they can do. */
      viewer: "signed-out" | "invitee" | "other-account";
      /** Signed out: no account yet (sign up here), a verified one (sign in first) or one never verified (the link proves it). */
      account: "none" | "verified" | "unverified";
    };
