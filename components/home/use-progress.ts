"use client";
// The signed-in viewer's progress (GET /api/progress), read in the browser so the pages that show
// it can stay static. null = signed out. One request is shared by every component using it.
import { useRemoteData } from "@/lib/client/remote-data";
import type { CourseProgressDto, ProgressOverviewDto } from "@/lib/dto/progress";

export const PROGRESS_KEY = "/api/progress";

async function fetchProgress(url: string): Promise<ProgressOverviewDto | null> {
  const res = await fetch(url, { credentials: "same-origin", cache: "no-store" });
  if (res.status === 401) return null;
  if (!res.ok) throw new Error(`progress: ${res.status}`);
  const body = (await res.json()) as { ok: true; signedIn?: false } & ProgressOverviewDto;
  if (body.signedIn === false) return null;
  return { courses: body.courses };
}

export function useProgress() {
  return useRemoteData(PROGRESS_KEY, fetchProgress, { revalidateOnFocus: true });
}

/** The viewer's progress on one course, undefined while loading, null when signed out or without a seat. */
export function useCourseProgress(courseSlug: string): { course: CourseProgressDto | null | undefined; isLoading: boolean } {
  const { data, isLoading, error } = useProgress();
  if (isLoading || (data === undefined && !error)) return { course: undefined, isLoading: true };
  return { course: data?.courses.find((c) => c.courseSlug === courseSlug) ?? null, isLoading: false };
}
