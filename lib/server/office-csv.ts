import "server-only";
// The class table as a CSV file (RFC 4180 via csv-stringify). Cells a spreadsheet would read as a
// formula (starting with = + - @, or a tab or carriage return) get a leading apostrophe, as OWASP's
// "CSV Injection" page advises, so a name like "=HYPERLINK(…)" stays text.
import { stringify } from "csv-stringify/sync";
import type { ClassOfficeDto } from "@/lib/dto/school-office";

export function neutralizeCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** Pure: the office DTO (already sorted) as CSV text, one row per apprentice. */
export function classOfficeCsv(office: ClassOfficeDto): string {
  const header = ["name", "email", "joined_utc", "lessons_completed", "lessons_total", "percent", "last_opened_utc", ...office.quizzes.map((q) => `best_percent: ${q.title}`)];
  const rows = office.apprentices.map((a) => [
    a.name,
    a.email,
    a.joinedAt,
    String(a.completedLessons),
    String(a.totalLessons),
    String(a.percent),
    a.lastViewedAt ?? "",
    ...office.quizzes.map((q) => (a.bestByBank[q.bankId] === undefined || a.bestByBank[q.bankId] === null ? "" : String(a.bestByBank[q.bankId]))),
  ]);
  return stringify([header, ...rows].map((r) => r.map(neutralizeCell)), { record_delimiter: "\r\n" });
}

/** A file name from the class name: letters, digits and dashes only. */
export function csvFileName(office: ClassOfficeDto): string {
  const slug = office.name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "class";
  return `${slug}-roster.csv`;
}
