// A perch on the canvas: a branch as thick as its thickness, with a dashed grain along it.
import { Group, Line } from 'react-konva';
import { C } from '../canvas/colors';
import { stageEnds } from './segment';
import { NumberField, Section } from '../panels/FormFields';
import { SegmentForm } from '../panels/ShapeForms';
import { useObjectEdit } from '../panels/useObjectEdit';
import type { PerchObject } from '../state/types';
import type { StudioKind } from './types';

function BranchSection({ o }: { o: PerchObject }) {
  const { field } = useObjectEdit(o);
  return (
    <Section title="Branch">
      <NumberField label="Thickness" testId="field-thickness" {...field('thickness', 'length')} />
    </Section>
  );
}

export const perch: StudioKind<'perch'> = {
  Shape: ({ o, cam }) => {
    const [a, b] = stageEnds(o, cam);
    const w = Math.max(3, o.thickness * cam.zoom);
    return (
      <Group listening={false}>
        <Line points={[a.x, a.y, b.x, b.y]} stroke={C.sand800} strokeWidth={w + 2} lineCap="round" />
        <Line points={[a.x, a.y, b.x, b.y]} stroke={C.sand700} strokeWidth={w} lineCap="round" />
        <Line
          points={[a.x, a.y, b.x, b.y]}
          stroke={C.sand500}
          strokeWidth={Math.max(1, w / 5)}
          lineCap="round"
          opacity={0.6}
          dash={[w, w / 2]}
        />
      </Group>
    );
  },
  icon: <path d="M3 18L21 7" strokeWidth="4" strokeLinecap="round" />,
  Form: ({ o }) => (
    <SegmentForm o={o}>
      <BranchSection o={o} />
    </SegmentForm>
  ),
};
