// Client-safe DTOs of the role homes (lib/server/homes.ts returns them).

export type ClassSummaryDto = { id: string; name: string; term: string; courseSlug: string; schoolName: string; apprentices: number };

export type SchoolOfficeDto = { schoolId: string; schoolName: string; classes: ClassSummaryDto[] };
