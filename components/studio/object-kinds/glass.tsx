// A glass pane on the canvas: a pale blue bar with a bright edge line.
import { Group, Line } from 'react-konva';
import { C } from '../canvas/colors';
import { stageEnds } from './segment';
import { SegmentForm, UvbPassedSection } from '../panels/ShapeForms';
import type { StudioKind } from './types';

export const glass: StudioKind<'glass'> = {
  Shape: ({ o, cam }) => {
    const [a, b] = stageEnds(o, cam);
    return (
      <Group listening={false}>
        <Line points={[a.x, a.y, b.x, b.y]} stroke={C.sky300} strokeWidth={5} lineCap="butt" opacity={0.9} />
        <Line points={[a.x, a.y, b.x, b.y]} stroke={C.white} strokeWidth={1} opacity={0.9} />
      </Group>
    );
  },
  icon: (
    <>
      <rect x="9" y="3" width="6" height="18" rx="1" />
      <path d="M11 6l2-2M11 10l2-2" />
    </>
  ),
  Form: ({ o }) => (
    <SegmentForm o={o}>
      <UvbPassedSection
        o={o}
        title="Material"
        label="UVB passed"
        hint="Glass passes none; acrylic varies (some pass UVB): enter its measured share"
      />
    </SegmentForm>
  ),
};
