/** What an import did beyond copying: the bundle it was read from, the schema migration, a new name. */
export function NotesList({ notes }: { notes: string[] }) {
  if (notes.length === 0) return null;
  return (
    <ul className="list-disc space-y-0.5 pl-5 text-sm text-ink-soft">
      {notes.map((note) => (
        <li key={note}>{note}</li>
      ))}
    </ul>
  );
}
