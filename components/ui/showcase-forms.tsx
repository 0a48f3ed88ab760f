import { Button } from "./button";
import { Checkbox } from "./checkbox";
import { FormField } from "./form-field";
import { Input } from "./input";
import { RadioGroup } from "./radio-group";
import { Select } from "./select";
import { ShowcaseSection, type ShowcaseCopy } from "./showcase-sections";
import { SubmitButton } from "./submit-button";
import { Textarea } from "./textarea";

/* Form primitives in their states: hint, error, required, read-only, disabled, checked. */

export function FormsShowcase({ copy }: ShowcaseCopy) {
  return (
    <ShowcaseSection title="Form fields">
      <form id={`forms-${copy}`} className="grid gap-stack md:grid-cols-2" aria-label={`Example placement form (${copy})`}>
        <FormField label="Placement title" name="title" hint="Shown to your instructor in the review queue." required>
          {(control) => <Input defaultValue="Snare, top head" {...control} />}
        </FormField>
        <FormField
          label="Distance from the source (cm)"
          name="distanceCm"
          error="Enter a distance between 1 and 100 cm."
          required
        >
          {(control) => <Input inputMode="decimal" defaultValue="250" {...control} />}
        </FormField>
        <FormField label="Pickup" name="pickup" hint="What you put on the stand.">
          {(control) => (
            <Select defaultValue="dynamic-cardioid" {...control}>
              <option value="dynamic-cardioid">Rugged cardioid dynamic</option>
              <option value="sdc">Small-diaphragm condenser</option>
              <option value="di-active">Active DI</option>
            </Select>
          )}
        </FormField>
        <FormField label="Read-only class" name="className">
          {(control) => <Input readOnly defaultValue="Spring class: Miking the band" {...control} />}
        </FormField>
        <FormField label="Notes for the reviewer" name="notes" className="md:col-span-2">
          {(control) => (
            <Textarea
              placeholder="Where is the null aimed? Which wedge is it rejecting?"
              {...control}
            />
          )}
        </FormField>
        <div className="flex flex-col gap-3">
          <Checkbox name="phantomOff" label="Phantom power was off while patching" defaultChecked />
          <Checkbox
            name="cablesDressed"
            label="Cables dressed and taped across the walkway"
            hint="Trip hazards are checked before doors."
          />
          <Checkbox name="consent" label="The band agreed to photos" error="Ask the band before you upload." />
          <Checkbox name="disabledExample" label="Locked after review" disabled />
        </div>
        <RadioGroup
          legend="Pattern aimed at the wedge"
          name="pattern"
          defaultValue="cardioid"
          hint="Pick the pattern whose null points at the monitor."
          options={[
            { value: "cardioid", label: "Cardioid", hint: "Null at the rear (180°)" },
            { value: "supercardioid", label: "Supercardioid" },
            { value: "figure-8", label: "Figure-8" },
          ]}
        />
        <RadioGroup
          legend="Redo needed?"
          name="redo"
          orientation="horizontal"
          error="Choose one before sending the review."
          options={[
            { value: "yes", label: "Yes" },
            { value: "no", label: "No" },
          ]}
        />
        <div className="flex flex-wrap gap-3 md:col-span-2">
          <SubmitButton>Send for review</SubmitButton>
          <Button variant="ghost" type="reset">
            Reset
          </Button>
        </div>
      </form>
    </ShowcaseSection>
  );
}
