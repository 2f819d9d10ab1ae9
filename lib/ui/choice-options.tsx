/** The `<option>`s of a picker over records shown by name (customers, machines, plans). */
export function ChoiceOptions({ choices }: { choices: readonly { id: string; name: string }[] }) {
  return choices.map((c) => (
    <option key={c.id} value={c.id}>
      {c.name}
    </option>
  ));
}
