import { DesignShapes, SKETCH_LOOK } from '@/components/designs/DesignShapes';
import { DesignSvg } from '@/components/designs/DesignSvg';
import { LAMP_LOOK } from '@/shared/lamp-look';
import type { Design } from '@/simulation';

/**
 * A small front-view drawing of a proposed design (not the studio: no editing, no fields), so the
 * person sees where the lamps, the perch and the hide go before anything is created.
 */
export function ProposalSketch({ design, label }: { design: Design; label: string }) {
  const { width: W, height: H } = design.enclosure;

  return (
    <figure className="rounded-lg border border-basalt-200 bg-white p-3">
      <DesignSvg design={design} pad={6} label={label} style={{ maxHeight: 360 }}>
        <rect x={0} y={0} width={W} height={H} fill="#f5f6f4" stroke="#5f6756" strokeWidth={0.8} />
        <DesignShapes objects={design.objects} look={SKETCH_LOOK} />
      </DesignSvg>
      <figcaption className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-caption text-basalt-600">
        {(['uv', 'heat'] as const).map((kind) => (
          <span key={kind}>
            <svg aria-hidden="true" width="14" height="8" className="mr-1 inline-block align-baseline">
              <rect
                x="0.75"
                y="0.75"
                width="12.5"
                height="6.5"
                rx="3.25"
                fill={LAMP_LOOK[kind].fill}
                stroke={LAMP_LOOK[kind].stroke}
                strokeWidth="1.5"
              />
            </svg>
            {kind === 'uv' ? 'UV lamp' : 'heat lamp'}
          </span>
        ))}
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
