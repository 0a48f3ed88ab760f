// Client-safe DTOs of lesson progress (lib/server/progress.ts returns them; GET /api/progress sends them).

export type ModuleProgressDto = { slug: string; title: string; completedLessons: number; totalLessons: number; percent: number };

export type LessonLinkDto = { lessonId: string; title: string; href: string };

export type CourseProgressDto = {
  courseSlug: string;
  title: string;
  href: string;
  completedLessons: number;
  totalLessons: number;
  percent: number;
  modules: ModuleProgressDto[];
  completedLessonIds: string[];
  /** The lesson to resume: the last one opened if unfinished, else the next unfinished one. */
  continueLesson: LessonLinkDto | null;
  lastViewedAt: string | null;
};

export type ProgressOverviewDto = { courses: CourseProgressDto[] };
