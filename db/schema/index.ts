export * from "./users";
export * from "./schools";
export * from "./audit";
export * from "./mail";
export * from "./learning";
export * from "./quizzes";
export * from "./uploads";
export * from "./placements";
