"use client";
// The apprentice's uploader for a placement brief: several photos, each uploaded on its own
// through the upload service's SDK (@uploadthing/react, against our placementPhoto route) with
// its own progress bar, cancel and retry, and a caption; then one submit of the processed ones.
import { generateReactHelpers } from "@uploadthing/react";
import { useRouter } from "next/navigation";
import { useId, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { ProgressBar } from "@/components/ui/progress-bar";
import { Textarea } from "@/components/ui/textarea";
import { PLACEMENT_LIMITS } from "@/lib/dto/placements";
import type { FormState } from "@/lib/dto/result";
import { PHOTO_LIMITS, type PhotoUploadOutcome } from "@/lib/dto/uploads";
import type { PlacementFileRouter } from "@/lib/storage/file-router";

const { uploadFiles } = generateReactHelpers<PlacementFileRouter>({ url: "/api/uploadthing" });

type Item = {
  key: string;
  file: File;
  state: "uploading" | "ready" | "failed" | "cancelled";
  progress: number;
  uploadId: string | null;
  thumbUrl: string | null;
  message: string | null;
  caption: string;
};

export type SubmitPhotos = (input: { briefId: string; photos: { uploadId: string; caption: string }[] }) => Promise<FormState>;

const errorText = (e: unknown) => (e instanceof Error && e.message ? e.message : "The upload failed. Try again.");

export function PhotoUploader({ briefId, min, max, submit }: { briefId: string; min: number; max: number; submit: SubmitPhotos }) {
  const router = useRouter();
  const inputId = useId();
  const [items, setItems] = useState<Item[]>([]);
  const [status, setStatus] = useState<FormState | null>(null);
  const [sending, setSending] = useState(false);
  const controllers = useRef(new Map<string, AbortController>());

  const update = (key: string, patch: Partial<Item>) => setItems((all) => all.map((i) => (i.key === key ? { ...i, ...patch } : i)));

  async function upload(key: string, file: File) {
    const controller = new AbortController();
    controllers.current.set(key, controller);
    update(key, { state: "uploading", progress: 0, message: null });
    try {
      const [result] = await uploadFiles("placementPhoto", { files: [file], signal: controller.signal, onUploadProgress: ({ progress }) => update(key, { progress }) });
      const outcome = result?.serverData as PhotoUploadOutcome | undefined;
      if (outcome?.status === "processed") update(key, { state: "ready", progress: 100, uploadId: outcome.uploadId, thumbUrl: outcome.thumbUrl });
      else update(key, { state: "failed", message: outcome && "message" in outcome ? outcome.message : "The photo could not be processed." });
    } catch (e) {
      update(key, controller.signal.aborted ? { state: "cancelled", message: "Upload cancelled." } : { state: "failed", message: errorText(e) });
    } finally {
      controllers.current.delete(key);
    }
  }

  function addFiles(list: FileList | null) {
    const room = max - items.length;
    const files = Array.from(list ?? []).slice(0, Math.max(0, room));
    const added = files.map((file) => ({ key: crypto.randomUUID(), file, state: "uploading" as const, progress: 0, uploadId: null, thumbUrl: null, message: null, caption: "" }));
    setItems((all) => [...all, ...added]);
    for (const item of added) void upload(item.key, item.file);
  }

  async function send() {
    setSending(true);
    const ready = items.filter((i) => i.state === "ready" && i.uploadId);
    const result = await submit({ briefId, photos: ready.map((i) => ({ uploadId: i.uploadId!, caption: i.caption })) });
    setSending(false);
    setStatus(result);
    if (result.ok) {
      setItems([]);
      router.refresh();
    }
  }

  const ready = items.filter((i) => i.state === "ready").length;
  const busy = items.some((i) => i.state === "uploading");
  return (
    <div className="flex flex-col gap-4" data-testid="photo-uploader">
      <div className="flex flex-col gap-1.5">
        <label htmlFor={inputId} className="font-semibold">
          Add photos ({min === max ? min : `${min} to ${max}`}; JPEG, PNG or WebP, up to {PHOTO_LIMITS.maxBytes / 1024 / 1024} MB each)
        </label>
        <input
          id={inputId}
          type="file"
          accept="image/jpeg,image/png,image/webp"
          multiple
          disabled={items.length >= max}
          onChange={(e) => {
            addFiles(e.currentTarget.files);
            e.currentTarget.value = "";
          }}
          className="max-w-full text-body-sm file:mr-3 file:rounded-control file:border file:border-border file:bg-surface-raised file:px-3 file:py-2 file:font-semibold file:text-ink"
        />
      </div>
      {items.length > 0 && (
        <ol className="flex flex-col gap-4" aria-label="Photos for this attempt">
          {items.map((item, index) => (
            <li key={item.key} className="flex flex-col gap-2 rounded-card border border-rule bg-surface-raised p-3" data-state={item.state}>
              <div className="flex flex-wrap items-center gap-3">
                {item.thumbUrl && (
                  // eslint-disable-next-line @next/next/no-img-element -- served by our own route with the viewer's cookie
                  <img src={item.thumbUrl} alt={`Photo ${index + 1}, uploaded`} className="h-16 w-auto rounded-control border border-rule" />
                )}
                <span className="min-w-0 flex-1 truncate text-body-sm font-semibold">
                  Photo {index + 1}: {item.file.name}
                </span>
                {item.state === "uploading" && (
                  <Button type="button" variant="ghost" size="sm" onClick={() => controllers.current.get(item.key)?.abort()}>
                    Cancel upload of photo {index + 1}
                  </Button>
                )}
                {(item.state === "failed" || item.state === "cancelled") && (
                  <Button type="button" variant="secondary" size="sm" onClick={() => void upload(item.key, item.file)}>
                    Retry photo {index + 1}
                  </Button>
                )}
                {item.state !== "uploading" && (
                  <Button type="button" variant="ghost" size="sm" onClick={() => setItems((all) => all.filter((i) => i.key !== item.key))}>
                    Remove photo {index + 1}
                  </Button>
                )}
              </div>
              {item.state === "uploading" && <ProgressBar label={`Uploading photo ${index + 1}`} valueNow={item.progress} />}
              {item.state === "ready" && <p className="text-body-sm text-success">Uploaded and checked.</p>}
              {item.message && (
                <p className="text-body-sm text-danger" role="status">
                  {item.message}
                </p>
              )}
              <label className="flex flex-col gap-1 text-body-sm font-semibold">
                Caption for photo {index + 1}
                <Textarea rows={2} maxLength={PLACEMENT_LIMITS.captionChars} value={item.caption} onChange={(e) => update(item.key, { caption: e.currentTarget.value })} placeholder="What it shows and where the camera stood" />
              </label>
            </li>
          ))}
        </ol>
      )}
      <div aria-live="polite">{status && <Notice tone={status.ok ? "success" : "danger"}>{status.message}</Notice>}</div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="button" onClick={() => void send()} disabled={busy || ready < min || sending} loading={sending}>
          Send {ready} {ready === 1 ? "photo" : "photos"} for review
        </Button>
        {busy && <span className="text-body-sm text-ink-muted">Waiting for uploads to finish…</span>}
      </div>
    </div>
  );
}
