"use client";
// React glue for AnswerSaver: one saver per attempt, its snapshot as state, and the browser's
// "online" event as a cue to retry at once.
import { useEffect, useState } from "react";
import { AnswerSaver, type SaverSnapshot } from "./answer-saver";

const IDLE: SaverSnapshot = { status: "idle", unsavedQuestionIds: [], message: null, retryInMs: null };

export function useAnswerSaver(attemptId: string, initialSeq: number, onClosed: (message: string) => void) {
  const [snapshot, setSnapshot] = useState<SaverSnapshot>(IDLE);
  const [saver] = useState(() => new AnswerSaver({ attemptId, initialSeq, onChange: setSnapshot }));

  useEffect(() => {
    saver.setClosedHandler(onClosed);
  }, [saver, onClosed]);

  useEffect(() => {
    const online = () => saver.retryNow();
    window.addEventListener("online", online);
    return () => {
      window.removeEventListener("online", online);
      saver.dispose();
    };
  }, [saver]);

  return { saver, snapshot };
}
