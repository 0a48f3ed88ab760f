"use server";
import { unlessUnavailable } from "@/lib/server/unavailable";
// Thin server action: the viewer, then lib/server/progress (zod validation and the seat check live there).
import type { Result } from "@/lib/server/errors";
import { markLessonComplete } from "@/lib/server/progress";
import { getViewer } from "@/lib/server/viewer";

export async function markLessonCompleteAction(input: { courseSlug: string; lessonId: string; completed: boolean }): Promise<Result<{ completedAt: string | null }>> {
  return unlessUnavailable(async () => markLessonComplete(await getViewer(), input), (failure) => failure);
}
