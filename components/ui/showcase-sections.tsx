import type { ReactNode } from "react";
import { Badge, type BadgeTone } from "./badge";
import { Button } from "./button";
import { Card, CardDescription, CardFooter, CardHeader, CardTitle } from "./card";
import { Dialog, DialogClose, DialogContent, DialogFooter, DialogTrigger } from "./dialog";
import { EmptyState } from "./empty-state";
import { LinkButton } from "./link-button";
import { Notice } from "./notice";
import { ProgressBar } from "./progress-bar";
import { LoadingRegion, Skeleton } from "./skeleton";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "./table";
import { Tabs, TabsContent, TabsList, TabsTrigger } from "./tabs";
import { ToastButton } from "./toast";

/* Example states of every primitive, in the invented scenario: the Kestrel Bay Audio School
   spring class setting up The Tideline Four at The Lantern Room. */

export function ShowcaseSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-4">
      <h3 className="text-title-3 text-ink">{title}</h3>
      <div aria-hidden="true" className="axis-rule" />
      {children}
    </section>
  );
}

/** Which copy of the showcase (page theme or forced dark); keeps ids and landmark names unique. */
export type ShowcaseCopy = { copy: string };

export function ButtonsShowcase({ copy }: ShowcaseCopy) {
  return (
    <ShowcaseSection title="Buttons">
      <div className="flex flex-wrap items-center gap-3">
        <Button>Submit placement</Button>
        <Button variant="secondary">Save draft</Button>
        <Button variant="ghost">Skip for now</Button>
        <Button variant="danger">Reclaim seat</Button>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button size="sm">Small</Button>
        <Button size="md">Medium</Button>
        <Button size="lg">Large</Button>
        <Button loading>Sending photo</Button>
        <Button variant="secondary" disabled>
          Disabled
        </Button>
        <LinkButton href={`#forms-${copy}`}>Link styled as a button</LinkButton>
        <LinkButton href={`#forms-${copy}`} variant="primary">
          Start lesson
        </LinkButton>
      </div>
    </ShowcaseSection>
  );
}

const badgeTones: readonly { tone: BadgeTone; label: string }[] = [
  { tone: "neutral", label: "Draft" },
  { tone: "accent", label: "Preview" },
  { tone: "secondary", label: "In class" },
  { tone: "success", label: "Approved" },
  { tone: "caution", label: "Redo asked" },
  { tone: "danger", label: "Overdue" },
  { tone: "note", label: "New" },
];

export function StatusShowcase() {
  return (
    <ShowcaseSection title="Badges and notices">
      <div className="flex flex-wrap gap-2">
        {badgeTones.map(({ tone, label }) => (
          <Badge key={tone} tone={tone}>
            {label}
          </Badge>
        ))}
      </div>
      <div className="flex flex-wrap gap-2">
        {badgeTones.map(({ tone, label }) => (
          <Badge key={tone} tone={tone} withIcon>
            {label}
          </Badge>
        ))}
      </div>
      <Notice tone="caution" title="Phantom power">
        <p>Mute the channel and switch phantom power off before you patch or unpatch a condenser or an active DI.</p>
      </Notice>
      <Notice tone="danger" title="Mains safety earth">
        <p>
          Never lift a mains safety earth to cure a hum. Use the DI&apos;s ground-lift switch, and follow local
          electrical codes and the venue&apos;s rules.
        </p>
      </Notice>
      <Notice tone="note" title="Hearing">
        <p>Wear hearing protection during the drum check; exposure adds up over a night.</p>
      </Notice>
      <Notice tone="success" title="Review sent">
        <p>Ines Calloway will see your placement in her review queue.</p>
      </Notice>
    </ShowcaseSection>
  );
}

export function CardsShowcase({ copy }: ShowcaseCopy) {
  return (
    <ShowcaseSection title="Cards, progress and empty state">
      <div className="grid gap-4 md:grid-cols-2">
        <Card as="article">
          <CardHeader>
            <Badge tone="accent" className="self-start">
              Lesson 1 of 12
            </Badge>
            <CardTitle level={4}>The order of work on a band stage</CardTitle>
            <CardDescription>Stage box, stands, microphones, cables, DIs, then the patch. 12 minutes.</CardDescription>
          </CardHeader>
          <ProgressBar label="Miking the band" valueNow={7} valueMax={12} valueText="7 of 12 lessons" />
          <CardFooter>
            <LinkButton href={`#forms-${copy}`} variant="primary" size="sm">
              Continue
            </LinkButton>
            <LinkButton href={`#forms-${copy}`} variant="ghost" size="sm">
              Syllabus
            </LinkButton>
          </CardFooter>
        </Card>
        <Card>
          <CardHeader>
            <CardTitle level={4}>Seats</CardTitle>
            <CardDescription>Spring class at Kestrel Bay Audio School.</CardDescription>
          </CardHeader>
          <ProgressBar label="Seats used" valueNow={8} valueMax={10} valueText="8 of 10 seats" />
          <ProgressBar label="Quiz: pickup patterns" valueNow={0} />
          <ProgressBar label="Course complete" valueNow={100} />
        </Card>
      </div>
      <EmptyState
        titleLevel={4}
        title="No placements to review"
        description="When an apprentice sends a photo of a placement, it appears here with its brief and rubric."
        action={<LinkButton href={`#forms-${copy}`}>See the briefs</LinkButton>}
      />
      <LoadingRegion label="Loading the review queue">
        <Skeleton className="h-6 w-1/3" />
        <Skeleton className="w-full" />
        <Skeleton className="w-5/6" />
      </LoadingRegion>
    </ShowcaseSection>
  );
}

const inputList = [
  { channel: 1, source: "Kick drum", pickup: "Rugged cardioid dynamic", stand: "Short boom", phantom: false },
  { channel: 2, source: "Snare, top", pickup: "Rugged cardioid dynamic", stand: "Clip", phantom: false },
  { channel: 5, source: "Bass (Joss)", pickup: "Active DI, thru to amp", stand: "None", phantom: true },
  { channel: 9, source: "Keys left (Priya)", pickup: "Passive DI", stand: "None", phantom: false },
  { channel: 12, source: "Lead vocal (Maren)", pickup: "Supercardioid dynamic", stand: "Tall boom", phantom: false },
] as const;

export function TableShowcase({ copy }: ShowcaseCopy) {
  return (
    <ShowcaseSection title="Table">
      <Table caption={`Input list: The Tideline Four at The Lantern Room (${copy})`}>
        <TableHead>
          <TableRow>
            <TableHeaderCell numeric>Ch</TableHeaderCell>
            <TableHeaderCell>Source</TableHeaderCell>
            <TableHeaderCell>Pickup</TableHeaderCell>
            <TableHeaderCell>Stand</TableHeaderCell>
            <TableHeaderCell>Phantom</TableHeaderCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {inputList.map((row) => (
            <TableRow key={row.channel}>
              <TableCell numeric>{row.channel}</TableCell>
              <TableHeaderCell scope="row" className="font-normal">
                {row.source}
              </TableHeaderCell>
              <TableCell>{row.pickup}</TableCell>
              <TableCell>{row.stand}</TableCell>
              <TableCell>{row.phantom ? <Badge tone="caution">P48 on</Badge> : "Off"}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </ShowcaseSection>
  );
}

export function InteractiveShowcase() {
  return (
    <ShowcaseSection title="Tabs, dialog and toast">
      <Tabs defaultValue="lesson">
        <TabsList aria-label="Lesson views">
          <TabsTrigger value="lesson">Lesson</TabsTrigger>
          <TabsTrigger value="bench">Bench</TabsTrigger>
          <TabsTrigger value="quiz">Quiz</TabsTrigger>
          <TabsTrigger value="locked" disabled>
            Certificate
          </TabsTrigger>
        </TabsList>
        <TabsContent value="lesson">
          <p className="text-body text-ink">Read the lesson, then try the figure on the Bench.</p>
        </TabsContent>
        <TabsContent value="bench">
          <p className="text-body text-ink">Turn the polar plot and watch the rear null move.</p>
        </TabsContent>
        <TabsContent value="quiz">
          <p className="text-body text-ink">Five questions; you can take it again.</p>
        </TabsContent>
      </Tabs>
      <div className="flex flex-wrap gap-3">
        <Dialog>
          <DialogTrigger asChild>
            <Button variant="danger">Reclaim unused seat…</Button>
          </DialogTrigger>
          <DialogContent
            title="Reclaim this seat?"
            description="The invitation to this address stops working. You can invite someone else to the seat."
          >
            <DialogFooter>
              <DialogClose asChild>
                <Button variant="secondary">Keep seat</Button>
              </DialogClose>
              <DialogClose asChild>
                <Button variant="danger">Reclaim seat</Button>
              </DialogClose>
            </DialogFooter>
          </DialogContent>
        </Dialog>
        <ToastButton variant="secondary" toast={{ title: "Draft saved", tone: "success" }}>
          Show a success toast
        </ToastButton>
        <ToastButton
          variant="secondary"
          toast={{ title: "Upload failed", description: "The photo is larger than 8 MB.", tone: "danger" }}
        >
          Show an error toast
        </ToastButton>
      </div>
    </ShowcaseSection>
  );
}
