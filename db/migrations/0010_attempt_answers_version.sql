ALTER TABLE "quiz_attempts" ADD COLUMN "answers_version" integer DEFAULT 0 NOT NULL;
