/**
 * The sign-in page's picture: a state-of-charge line that enters a shaded band, rides the
 * steady cycle and leaves it at the end (entry arc, band, leaving arc) in our own colours.
 */
const width = 420;
const height = 180;
const steady = (x: number) => 92 - 34 * Math.sin((x / width) * Math.PI * 4);

function path(points: readonly (readonly [number, number])[]): string {
  return points.map(([x, y], i) => `${i ? 'L' : 'M'}${x.toFixed(1)},${y.toFixed(1)}`).join(' ');
}

const xs = Array.from({ length: 85 }, (_, i) => (i * width) / 84);
const upper = xs.map((x) => [x, steady(x) - 12] as const);
const lower = xs.map((x) => [x, steady(x) + 12] as const).reverse();
const soc = xs.map((x) => {
  const entry = Math.exp(-x / 40) * 70;
  const leave = x > 340 ? ((x - 340) / 80) ** 2 * 60 : 0;
  return [x, steady(x) + entry + leave] as const;
});
const leaving = soc.filter(([x]) => x >= 336);

export function TideIllustration() {
  return (
    <svg viewBox={`0 0 ${width} ${height}`} className="w-full max-w-md" aria-hidden="true">
      {[30, 60, 90, 120, 150].map((y) => (
        <line key={y} x1="0" x2={width} y1={y} y2={y} stroke="#2a4470" strokeWidth="1" strokeDasharray="2 6" />
      ))}
      <path d={`${path(upper)} ${path(lower).replace('M', 'L')} Z`} fill="#45b394" fillOpacity="0.18" />
      <path
        d={path(xs.map((x) => [x, steady(x)] as const))}
        fill="none"
        stroke="#98dcc6"
        strokeWidth="1.5"
        strokeDasharray="5 5"
      />
      <path d={path(soc.filter(([x]) => x <= 340))} fill="none" stroke="#45b394" strokeWidth="3.5" strokeLinecap="round" />
      <path d={path(leaving)} fill="none" stroke="#e0961f" strokeWidth="3.5" strokeLinecap="round" />
    </svg>
  );
}
