export function HomeRoute() {
  return (
    <section className="space-y-4">
      <h1 className="text-3xl font-semibold text-ink-900">Slackwater</h1>
      <p className="max-w-2xl text-ink-700">
        Plan how your batteries charge and discharge: upload price and load forecasts, find the steady daily cycle,
        see how much of each plan is safe to commit, and send signed-off schedules on as CSV.
      </p>
    </section>
  );
}
