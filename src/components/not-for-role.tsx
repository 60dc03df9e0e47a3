/** A page the signed-in role may not use: its title stays, with what to do instead (the server refuses anyway). */
export function NotForRole({ title, children }: { title: string; children: string }) {
  return (
    <section className="max-w-4xl space-y-4">
      <h1 className="text-2xl font-semibold text-ink-900">{title}</h1>
      <p role="alert" className="rounded bg-white p-6 text-ink-700">
        {children}
      </p>
    </section>
  );
}
