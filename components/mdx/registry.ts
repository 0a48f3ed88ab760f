// The components a lesson may use, by the names lessons use (content/CONTENT contract). Shared by
// the static renderer (compileMDX), the locked-lesson tree renderer and the content check.
import { Callout } from "./callout";
import { Ch } from "./channel-ref";
import { Checklist } from "./checklist";
import { Diagram } from "./diagram";
import { Figure } from "./figure";
import { InputList } from "./input-list";
import { KeyTakeaways } from "./key-takeaways";
import { Term } from "./term";

export const MDX_COMPONENTS = { Callout, Figure, Diagram, Term, KeyTakeaways, Checklist, InputList, Ch } as const;

export type MdxComponentName = keyof typeof MDX_COMPONENTS;

export const MDX_COMPONENT_NAMES = Object.keys(MDX_COMPONENTS) as MdxComponentName[];

export function isMdxComponentName(name: string): name is MdxComponentName {
  return Object.hasOwn(MDX_COMPONENTS, name);
}
