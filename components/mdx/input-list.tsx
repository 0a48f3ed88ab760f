// <InputList />: The Lantern Room input list, drawn from the scenario data
// (content/scenario/lantern-room.json), so the lesson table and the rest of the courses cannot
// drift apart. `piano` adds the lines used on nights when the house grand is played.
import { ALL_INPUTS, SCENARIO, micOrDi } from "@/lib/content/scenario";

export function InputList({ piano }: { piano?: string }) {
  const rows = piano === "true" ? ALL_INPUTS : SCENARIO.inputs;
  return (
    <table>
      <caption className="text-left text-body-sm text-ink-muted">
        {SCENARIO.band.name} at {SCENARIO.venue.name}: input list
      </caption>
      <thead>
        <tr>
          <th scope="col">Ch</th>
          <th scope="col">Source</th>
          <th scope="col">Mic or DI</th>
          <th scope="col">Stand</th>
          <th scope="col">48 V</th>
          <th scope="col">Insert</th>
          <th scope="col">Notes</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((input) => (
          <tr key={input.channel}>
            <td>{input.channel}</td>
            <td>{input.source}</td>
            <td>{micOrDi(input)}</td>
            <td>{input.stand}</td>
            <td>{input.phantom ? "on" : "off"}</td>
            <td>{input.insert ?? ""}</td>
            <td>{input.notes}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
