"use client";
// The signed-in viewer's progress (GET /api/progress), read in the browser so the pages that show
// it can stay static. null = signed out. SWR shares one request between every component using it.
import useSWR from "swr";
import type { CourseProgressDto, ProgressOverviewDto } from "@/lib/server/progress";

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
  return useSWR(PROGRESS_KEY, fetchProgress, { revalidateOnFocus: true });
}

/** The viewer's progress on one course, undefined while loading, null when signed out or without a seat. */
export function useCourseProgress(courseSlug: string): { course: CourseProgressDto | null | undefined; isLoading: boolean } {
  const { data, isLoading, error } = useProgress();
  if (isLoading || (data === undefined && !error)) return { course: undefined, isLoading: true };
  return { course: data?.courses.find((c) => c.courseSlug === courseSlug) ?? null, isLoading: false };
}
