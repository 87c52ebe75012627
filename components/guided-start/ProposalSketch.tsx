import type { Design } from '@/simulation';

/**
 * A small front-view drawing of a proposed design (not the studio: no editing, no fields), so the
 * person sees where the lamps, the perch and the hide go before anything is created.
 */
export function ProposalSketch({ design, label }: { design: Design; label: string }) {
  const { width: W, height: H } = design.enclosure;
  const top = Math.max(H, ...design.objects.map((o) => (o.type === 'lamp' ? o.y + 4 : 0)));
  const pad = 6;
  const vbW = W + 2 * pad;
  const vbH = top + 2 * pad;
  const y = (v: number) => top + pad - v; // design y is up; SVG y is down
  const x = (v: number) => v + pad;

  return (
    <figure className="rounded-lg border border-basalt-200 bg-white p-3">
      <svg
        viewBox={`0 0 ${vbW} ${vbH}`}
        role="img"
        aria-label={label}
        className="h-auto w-full"
        style={{ maxHeight: 360 }}
      >
        <rect x={x(0)} y={y(H)} width={W} height={H} fill="#f5f6f4" stroke="#5f6756" strokeWidth={0.8} />
        {design.objects.map((o) => {
          switch (o.type) {
            case 'screen':
              return (
                <line
                  key={o.id}
                  x1={x(o.x1)}
                  y1={y(o.y1)}
                  x2={x(o.x2)}
                  y2={y(o.y2)}
                  stroke="#7e8673"
                  strokeWidth={1.2}
                  strokeDasharray="2 1.5"
                />
              );
            case 'glass':
              return (
                <line
                  key={o.id}
                  x1={x(o.x1)}
                  y1={y(o.y1)}
                  x2={x(o.x2)}
                  y2={y(o.y2)}
                  stroke="#4592d2"
                  strokeWidth={1.4}
                />
              );
            case 'perch':
              return (
                <line
                  key={o.id}
                  x1={x(o.x1)}
                  y1={y(o.y1)}
                  x2={x(o.x2)}
                  y2={y(o.y2)}
                  stroke="#94561f"
                  strokeWidth={o.thickness}
                  strokeLinecap="round"
                />
              );
            case 'hide':
            case 'ledge':
              return (
                <rect
                  key={o.id}
                  x={x(o.x)}
                  y={y(o.y + o.height)}
                  width={o.width}
                  height={o.height}
                  fill="#cdd1c8"
                  stroke="#4a5143"
                  strokeWidth={0.6}
                />
              );
            case 'lamp': {
              const heat = (o.uvbAt30 ?? 1) === 0;
              const fill = heat ? '#da5540' : '#8b5cf6';
              if (o.form === 'tube' && o.length) {
                return (
                  <rect
                    key={o.id}
                    x={x(o.x - o.length / 2)}
                    y={y(o.y) - 1.2}
                    width={o.length}
                    height={2.4}
                    rx={1.2}
                    fill={fill}
                  />
                );
              }
              return <circle key={o.id} cx={x(o.x)} cy={y(o.y)} r={2.4} fill={fill} />;
            }
            default:
              return null;
          }
        })}
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-caption text-basalt-600">
        <span>
          <span aria-hidden className="mr-1 inline-block h-2 w-3 rounded-sm bg-[#8b5cf6]" />
          UV lamp
        </span>
        <span>
          <span aria-hidden className="mr-1 inline-block h-2 w-3 rounded-sm bg-ember-500" />
          heat lamp
        </span>
        <span>
          <span aria-hidden className="mr-1 inline-block h-2 w-3 rounded-sm bg-sand-700" />
          basking perch
        </span>
        <span>
          <span aria-hidden className="mr-1 inline-block h-2 w-3 rounded-sm bg-basalt-300" />
          hide
        </span>
        <span>
          Front view, to scale; {W} × {H} cm.
        </span>
      </figcaption>
    </figure>
  );
}
