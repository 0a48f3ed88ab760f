// The serialisable form of a rendered lesson body, sent by GET /api/lessons/… to the player and
// drawn by components/mdx/lesson-tree.tsx. No code travels: only tags, components by name and
// plain props, so the browser never evaluates lesson source (and the CSP needs no 'unsafe-eval').

export type LessonTreeProps = Record<string, string | number | boolean>;

/** t: an HTML tag ("p", "h2", …) or a component name from the MDX registry ("Figure", "Term", …). */
export type LessonTreeElement = { t: string; p?: LessonTreeProps; c?: LessonTreeNode[] };

export type LessonTreeNode = string | LessonTreeElement;
