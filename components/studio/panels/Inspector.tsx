'use client';
// The inspector: the selected object's properties, a probe's, several objects' summary, or the
// enclosure's when nothing is selected.
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { updateObject } from '../state/document';
import { kindOf } from '@/shared/object-kinds';
import type { DesignObject } from '../state/types';
import { studioKindOf } from '../object-kinds';
import { CommandButton } from './CommandButton';
import { Section, TextField } from './FormFields';
import { EnclosureForm, ObjectList, ProbeForm } from './ShapeForms';

function ObjectActions() {
  return (
    <div className="flex flex-wrap gap-1 px-3 py-2">
      <CommandButton id="edit.duplicate" icon="duplicate" showLabel />
      <CommandButton id="edit.delete" icon="delete" showLabel />
      <CommandButton id="arrange.forward" icon="forward" showLabel />
      <CommandButton id="arrange.backward" icon="backward" showLabel />
    </div>
  );
}

function ObjectInspector({ o }: { o: DesignObject }) {
  const { store } = useCommandContext();
  // The kind's own fields come from its studio record (object-kinds/<kind>.tsx).
  const { Form } = studioKindOf(o.type);
  return (
    <div data-testid="inspector-object" data-object-id={o.id}>
      <Section title={`${kindOf(o.type).name} · ${o.id}`}>
        <TextField
          label="Name"
          value={o.name}
          placeholder={kindOf(o.type).name}
          onCommit={(name) => store.edit((d) => updateObject(d, o.id, { name }))}
        />
      </Section>
      <Form key={o.id} o={o} />
      <ObjectActions />
    </div>
  );
}

export function Inspector() {
  const { store } = useCommandContext();
  const selection = useStudio(store, (s) => s.session.selection);
  const design = useStudio(store, (s) => s.history.present);
  const objects = design.objects.filter((o) => selection.includes(o.id));
  const probes = (design.probes ?? []).filter((p) => selection.includes(p.id));
  if (selection.length === 0) {
    return (
      <>
        <EnclosureForm />
        <ObjectList />
      </>
    );
  }
  if (objects.length === 1 && probes.length === 0) return <ObjectInspector o={objects[0]!} />;
  if (probes.length === 1 && objects.length === 0) {
    return (
      <>
        <ProbeForm key={probes[0]!.id} probe={probes[0]!} />
        <div className="px-3 py-2">
          <CommandButton id="edit.delete" icon="delete" showLabel />
        </div>
      </>
    );
  }
  return (
    <div data-testid="inspector-multi">
      <Section title={`${selection.length} selected`}>
        <ul className="text-sm text-basalt-700">
          {objects.map((o) => (
            <li key={o.id}>
              {kindOf(o.type).name} {o.name ? `“${o.name}”` : o.id}
            </li>
          ))}
          {probes.map((p) => (
            <li key={p.id}>Probe {p.label ?? p.id}</li>
          ))}
        </ul>
        <p className="text-caption text-basalt-500">Move them together by dragging or with the arrow keys.</p>
      </Section>
      <ObjectActions />
    </div>
  );
}
