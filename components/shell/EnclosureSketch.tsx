/**
 * A decorative side view of an enclosure: a lamp under the lid, bands of light falling off with distance,
 * a basking ledge in the light and a hide in the shade. Purely illustrative — no computed values.
 */
export function EnclosureSketch() {
  return (
    <svg
      viewBox="0 0 360 200"
      className="h-auto w-full"
      role="img"
      aria-label="Side view of an enclosure: a lamp under the lid, bands of light fading away from it, a basking ledge under the lamp and a hide in the shade"
    >
      <defs>
        <clipPath id="sketch-inside">
          <rect x="10" y="20" width="340" height="170" rx="6" />
        </clipPath>
      </defs>
      <rect x="10" y="20" width="340" height="170" rx="6" className="fill-white" />
      <g clipPath="url(#sketch-inside)">
        {[170, 125, 88, 55].map((r, i) => (
          <ellipse
            key={r}
            cx="245"
            cy="24"
            rx={r}
            ry={r * 0.9}
            className={['fill-sand-50', 'fill-sand-100', 'fill-sand-200', 'fill-sand-300'][i]}
          />
        ))}
        <path d="M40 160 L150 118" className="stroke-sand-800" strokeWidth="7" strokeLinecap="round" />
        <rect x="200" y="128" width="100" height="62" rx="4" className="fill-basalt-300" />
        <rect x="22" y="154" width="66" height="36" rx="4" className="fill-moss-700" />
      </g>
      <rect
        x="10"
        y="20"
        width="340"
        height="170"
        rx="6"
        fill="none"
        className="stroke-basalt-500"
        strokeWidth="2"
      />
      <line
        x1="12"
        y1="20"
        x2="348"
        y2="20"
        className="stroke-basalt-600"
        strokeWidth="3"
        strokeDasharray="5 3"
      />
      <rect x="205" y="24" width="80" height="9" rx="3" className="fill-basalt-700" />
      <text x="250" y="122" textAnchor="middle" className="fill-basalt-700 text-[11px]">
        basking ledge
      </text>
      <text x="55" y="176" textAnchor="middle" className="fill-white text-[10px]">
        hide
      </text>
      <text x="95" y="84" textAnchor="middle" className="fill-basalt-600 text-[11px]">
        shade: no UV
      </text>
      <text x="245" y="46" textAnchor="middle" className="fill-basalt-800 text-[10px]">
        lamp
      </text>
    </svg>
  );
}
