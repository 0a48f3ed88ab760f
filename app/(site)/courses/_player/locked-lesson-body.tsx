"use client";
// The body of a lesson that needs a seat. The static page carries none of it: it is fetched from
// GET /api/lessons/<course>/<lesson> after the server has checked access, then drawn from its
// JSON tree with the same components (figures stay interactive). A visitor or a viewer without a
// seat gets a 200 saying why the lesson is locked, so the browser logs nothing.
import dynamic from "next/dynamic";
import Link from "next/link";
import { useEffect } from "react";
import { mutateRemote, useRemoteData } from "@/lib/client/remote-data";
import { PROGRESS_KEY } from "@/components/home/use-progress";
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";
import { AlertIcon, CautionIcon } from "@/components/ui/icons";
import type { LessonTreeNode } from "@/lib/content/lesson-tree-types";

// The tree renderer brings every MDX component and diagram with it, which a preview lesson (its
// body already in the HTML) never needs: it is loaded on demand, and asked for as soon as a
// locked body starts loading so it arrives alongside the body.
const loadLessonTree = () => import("@/components/mdx/lesson-tree").then((module) => module.LessonTree);
const LessonTree = dynamic(loadLessonTree, { loading: () => <BodySkeleton /> });

type BodyAnswer =
  | { kind: "ok"; tree: LessonTreeNode[] }
  | { kind: "sign-in"; message: string; signInHref: string }
  | { kind: "no-seat"; message: string }
  | { kind: "missing"; message: string };

type BodyJson = {
  lesson?: { tree: LessonTreeNode[] };
  /** The server's answer when this viewer may not read the lesson (a 200: visitors must see no console error). */
  locked?: "sign-in" | "seat";
  message?: string;
  signInHref?: string;
};

async function fetchBody(url: string): Promise<BodyAnswer> {
  const res = await fetch(url, { credentials: "same-origin", cache: "no-store" });
  const body = (await res.json().catch(() => ({}))) as BodyJson;
  const message = body.message ?? "This lesson could not be loaded.";
  if (res.ok && body.lesson) return { kind: "ok", tree: body.lesson.tree };
  if (res.ok && body.locked === "sign-in") return { kind: "sign-in", message, signInHref: body.signInHref ?? "/sign-in" };
  if (res.ok && body.locked === "seat") return { kind: "no-seat", message };
  if (res.status === 404) return { kind: "missing", message };
  throw new Error(`lesson body: ${res.status}`);
}

export function LockedLessonBody({ courseSlug, lessonId }: { courseSlug: string; lessonId: string }) {
  const { data, error, isLoading } = useRemoteData(`/api/lessons/${courseSlug}/${lessonId}`, fetchBody);

  useEffect(() => {
    void loadLessonTree();
  }, []);

  useEffect(() => {
    if (data?.kind !== "ok") return;
    // The visit was recorded with the fetch: refresh "Continue: …" elsewhere on the page.
    void mutateRemote(PROGRESS_KEY);
    // A link to a heading (#…) could not scroll before the body existed.
    const id = decodeURIComponent(window.location.hash.slice(1));
    if (id) document.getElementById(id)?.scrollIntoView();
  }, [data]);

  if (isLoading) return <BodySkeleton />;
  if (error || !data) {
    return (
      <Refusal tone="danger" title="The lesson did not load">
        <p>Check your connection and reload the page.</p>
      </Refusal>
    );
  }
  switch (data.kind) {
    case "ok":
      return (
        <div className="prose prose-axisline max-w-none" data-testid="lesson-body">
          <LessonTree nodes={data.tree} />
        </div>
      );
    case "sign-in":
      return (
        <Refusal tone="caution" title="Sign in to read this lesson">
          <p>{data.message}</p>
          <p>
            <Link href={data.signInHref} className="font-semibold">
              Sign in
            </Link>{" "}
            or <Link href={`/courses/${courseSlug}`}>see the free preview lessons of this course</Link>.
          </p>
        </Refusal>
      );
    case "no-seat":
      return (
        <Refusal tone="caution" title="A seat is needed for this lesson">
          <p>{data.message}</p>
          <p>
            <Link href={`/courses/${courseSlug}`}>Back to the course and its free preview lessons</Link>
          </p>
        </Refusal>
      );
    case "missing":
      return (
        <Refusal tone="danger" title="Lesson not found">
          <p>{data.message}</p>
        </Refusal>
      );
  }
}

function BodySkeleton() {
  return (
    <LoadingRegion label="Loading the lesson" className="my-8">
      <Skeleton className="h-6 w-2/3" />
      <Skeleton />
      <Skeleton />
      <Skeleton className="w-5/6" />
      <Skeleton className="h-40" />
    </LoadingRegion>
  );
}

function Refusal({ tone, title, children }: { tone: "caution" | "danger"; title: string; children: React.ReactNode }) {
  const Icon = tone === "danger" ? AlertIcon : CautionIcon;
  const box = tone === "danger" ? "border-danger bg-danger-soft" : "border-caution bg-caution-soft";
  const ink = tone === "danger" ? "text-danger" : "text-caution";
  return (
    <div role="status" className={`my-8 flex gap-3 rounded-card border-l-4 px-4 py-4 ${box}`} data-testid="lesson-refusal">
      <Icon className={`mt-1 ${ink}`} />
      <div className="space-y-2 text-ink">
        <p className={`font-semibold ${ink}`}>{title}</p>
        {children}
      </div>
    </div>
  );
}
