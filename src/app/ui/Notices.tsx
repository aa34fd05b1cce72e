/** Cautions from physics beside the results, and a general error that belongs to no field. */
export function Cautions({ title, messages }: { title: string; messages: readonly string[] }) {
  if (messages.length === 0) return null;
  return (
    <section class="cautions" aria-label={title}>
      <h3 class="cautions-title">{title}</h3>
      <ul>
        {messages.map((m, i) => (
          <li key={i}>{m}</li>
        ))}
      </ul>
    </section>
  );
}

export function ErrorNote({ message }: { message: string | undefined }) {
  if (!message) return null;
  return (
    <p class="error-note" role="status">
      {message}
    </p>
  );
}

export function Note({ children }: { children: preact.ComponentChildren }) {
  return <p class="note">{children}</p>;
}
