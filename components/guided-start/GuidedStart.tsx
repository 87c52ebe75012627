'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition, type FormEvent } from 'react';
import { CautionList } from '@/components/cautions/CautionList';
import { FindingList } from '@/components/cautions/FindingList';
import { Field } from '@/components/ui/Field';
import { Notice } from '@/components/ui/Notice';
import { Select } from '@/components/ui/Select';
import { PersonPicker, type PickedPerson } from '@/components/people/PersonPicker';
import { button, card } from '@/components/ui/styles';
import { UnitToggle } from '@/components/ui/UnitToggle';
import {
  cmToDisplay,
  cToDisplay,
  displayToC,
  displayToCm,
  formatNumber,
  type LengthUnit,
} from '@/shared/units';
import { useLengthUnit, useTempUnit } from '@/components/ui/units';
import { GUIDED_WALLS } from '@/lib/guided-start/input';
import type { ProposalView } from '@/lib/guided-start/queries';
import type { ActionResult } from '@/app/(app)/enclosures/new/actions';
import { ProposalSketch } from './ProposalSketch';

export type SpeciesChoice = {
  id: number;
  commonName: string;
  scientificName: string;
  uvZone: number;
  seedKey: string | null;
};
export type SizeHint = {
  width: number;
  height: number;
  depth: number;
  lid: 'mesh' | 'glass' | 'open';
  walls?: Walls;
};
type Walls = (typeof GUIDED_WALLS)[number];
type Actions = {
  propose: (raw: unknown) => Promise<ActionResult<ProposalView>>;
  create: (raw: unknown) => Promise<ActionResult<{ enclosureId: number; variantId: number }>>;
};

const LID_LABELS = { mesh: 'Mesh lid', glass: 'Glass lid', open: 'Open top' } as const;
/** The guided start's own words for the engine's wall materials (the values are the engine's). */
const WALL_LABELS: Record<Walls, string> = {
  glass: 'Glass tank or terrarium',
  wood: 'Wooden vivarium',
  pvc: 'PVC or melamine board',
  mesh: 'Mesh cage',
};
const show = (cm: number, unit: LengthUnit) => formatNumber(cmToDisplay(cm, unit), unit === 'cm' ? 0 : 1);

/** The enclosure's three inside measures, as typed in the size fields and named by the API. */
const SIDES = [
  { key: 'w', label: 'Width', field: 'widthCm' },
  { key: 'h', label: 'Height', field: 'heightCm' },
  { key: 'd', label: 'Depth', field: 'depthCm' },
] as const;

/** Species, size, lid and keeper → a proposed design explained → the enclosure, created and opened in the studio. */
export function GuidedStart(props: {
  organisationId: number;
  species: SpeciesChoice[];
  /** Owners and staff file the enclosure under a member; a keeper's is their own. */
  chooseKeeper: boolean;
  sizeHints: Record<string, SizeHint>;
  initialSpeciesId: number | null;
  actions: Actions;
}) {
  const router = useRouter();
  const [lengthUnit] = useLengthUnit();
  const [tempUnit] = useTempUnit();
  const hintFor = (id: number | null) => {
    const key = props.species.find((s) => s.id === id)?.seedKey;
    return key ? props.sizeHints[key] : undefined;
  };
  const initialHint = hintFor(props.initialSpeciesId) ?? {
    width: 120,
    height: 60,
    depth: 60,
    lid: 'mesh' as const,
  };
  const [speciesId, setSpeciesId] = useState<number | null>(props.initialSpeciesId);
  const [size, setSize] = useState({
    unit: lengthUnit,
    w: show(initialHint.width, lengthUnit),
    h: show(initialHint.height, lengthUnit),
    d: show(initialHint.depth, lengthUnit),
  });
  const [room, setRoom] = useState({ unit: tempUnit, text: formatNumber(cToDisplay(22, tempUnit), 0) });
  const [lid, setLid] = useState<'mesh' | 'glass' | 'open'>(initialHint.lid);
  const [walls, setWalls] = useState<Walls>(initialHint.walls ?? 'glass');
  const [keeper, setKeeper] = useState<PickedPerson | null>(null);
  const [name, setName] = useState('');
  const [animalName, setAnimalName] = useState('');
  const [error, setError] = useState<{ message: string; field?: string } | null>(null);
  const [proposal, setProposal] = useState<ProposalView | null>(null);
  const [pending, startTransition] = useTransition();

  // Typed sizes and temperature follow the page's unit choices.
  if (size.unit !== lengthUnit) {
    const conv = (t: string) =>
      t.trim() && Number.isFinite(Number(t)) ? show(displayToCm(Number(t), size.unit), lengthUnit) : t;
    setSize({ unit: lengthUnit, w: conv(size.w), h: conv(size.h), d: conv(size.d) });
  }
  if (room.unit !== tempUnit) {
    const v = Number(room.text);
    const text =
      room.text.trim() && Number.isFinite(v)
        ? formatNumber(cToDisplay(displayToC(v, room.unit), tempUnit), 1)
        : room.text;
    setRoom({ unit: tempUnit, text });
  }

  const chosen = props.species.find((s) => s.id === speciesId);
  const num = (t: string) => (t.trim() === '' ? NaN : Number(t.replace(',', '.')));
  const payload = () => ({
    organisationId: props.organisationId,
    speciesId: speciesId ?? 0,
    widthCm: Math.round(displayToCm(num(size.w), size.unit) * 10) / 10,
    heightCm: Math.round(displayToCm(num(size.h), size.unit) * 10) / 10,
    depthCm: Math.round(displayToCm(num(size.d), size.unit) * 10) / 10,
    lid,
    walls,
    roomTempC: Math.round(displayToC(num(room.text), room.unit) * 10) / 10,
    ...(keeper ? { keeperId: keeper.id } : {}),
    name: name.trim() || (chosen ? `${chosen.commonName} enclosure` : ''),
    animalName: animalName.trim() || null,
  });

  function chooseSpecies(id: number | null) {
    setSpeciesId(id);
    setProposal(null);
    const hint = hintFor(id);
    if (hint) {
      setSize({
        unit: lengthUnit,
        w: show(hint.width, lengthUnit),
        h: show(hint.height, lengthUnit),
        d: show(hint.depth, lengthUnit),
      });
      setLid(hint.lid);
      setWalls(hint.walls ?? 'glass');
    }
  }

  function submit(e: FormEvent) {
    e.preventDefault();
    setError(null);
    startTransition(async () => {
      const r = await props.actions.propose(payload());
      if (r.ok) setProposal(r.data);
      else setError(r.error);
    });
  }

  function create() {
    setError(null);
    startTransition(async () => {
      const r = await props.actions.create(payload());
      if (r.ok) router.push(`/studio/${r.data.variantId}`);
      else setError(r.error);
    });
  }

  const fieldError = (f: string) => (error?.field === f ? error.message : null);
  const edit = () => setProposal(null);

  return (
    <div className="space-y-6">
      {error && !error.field && <Notice tone="error">{error.message}</Notice>}
      <form
        onSubmit={submit}
        noValidate
        className={`${card} grid gap-4 p-5 sm:grid-cols-2`}
        aria-label="Guided start"
      >
        <Select
          id="gs-species"
          label="Species"
          className="sm:col-span-2"
          value={speciesId ?? ''}
          onChange={(e) => chooseSpecies(e.target.value ? Number(e.target.value) : null)}
          error={fieldError('speciesId')}
        >
          <option value="">Choose a species…</option>
          {props.species.map((s) => (
            <option
              key={s.id}
              value={s.id}
            >{`${s.commonName} (${s.scientificName}) — UV zone ${s.uvZone}`}</option>
          ))}
        </Select>
        <fieldset className="sm:col-span-2">
          <legend className="mb-1 flex w-full items-center justify-between text-body font-medium text-basalt-800">
            <span>Inside size ({size.unit}) — width × height × depth</span>
            <UnitToggle />
          </legend>
          <div className="grid grid-cols-3 gap-3">
            {SIDES.map(({ key, label, field }) => (
              <Field
                key={key}
                label={label}
                inputMode="decimal"
                value={size[key]}
                onChange={(e) => setSize({ ...size, [key]: e.target.value })}
                error={fieldError(field)}
              />
            ))}
          </div>
          {chosen?.seedKey && props.sizeHints[chosen.seedKey] && (
            <p className="mt-1 text-caption text-basalt-500">
              Filled in with a usual size for this species; change it to your enclosure’s.
            </p>
          )}
        </fieldset>
        <fieldset>
          <legend className="mb-1 text-body font-medium text-basalt-800">Lid</legend>
          <div className="flex flex-wrap gap-3">
            {(Object.keys(LID_LABELS) as (keyof typeof LID_LABELS)[]).map((l) => (
              <label key={l} className="inline-flex items-center gap-1.5 text-body text-basalt-800">
                <input type="radio" name="lid" value={l} checked={lid === l} onChange={() => setLid(l)} />
                {LID_LABELS[l]}
              </label>
            ))}
          </div>
          {lid === 'glass' && (
            <p className="mt-1 text-caption text-basalt-500">
              Glass passes no UVB: UV lamps go inside, under the lid.
            </p>
          )}
        </fieldset>
        <fieldset>
          <legend className="mb-1 text-body font-medium text-basalt-800">Walls</legend>
          <div className="flex flex-wrap gap-x-3 gap-y-1">
            {GUIDED_WALLS.map((w) => (
              <label key={w} className="inline-flex items-center gap-1.5 text-body text-basalt-800">
                <input
                  type="radio"
                  name="walls"
                  value={w}
                  checked={walls === w}
                  onChange={() => setWalls(w)}
                />
                {WALL_LABELS[w]}
              </label>
            ))}
          </div>
          <p className="mt-1 text-caption text-basalt-500">
            {walls === 'wood' || walls === 'pvc'
              ? 'Wood and board hold the lamps’ heat: the air warms about twice as much as in glass.'
              : walls === 'mesh'
                ? 'Mesh lets warm air out: the air stays close to the room’s.'
                : 'Glass lets some heat through; the air warms less than in wood or board.'}
          </p>
          {fieldError('walls') && (
            <p className="mt-1 text-caption font-medium text-ember-700">{fieldError('walls')}</p>
          )}
        </fieldset>
        <div>
          <div className="flex items-end gap-2">
            <Field
              className="flex-1"
              label={`Room temperature (°${room.unit})`}
              inputMode="decimal"
              value={room.text}
              onChange={(e) => setRoom({ ...room, text: e.target.value })}
              error={fieldError('roomTempC')}
              hint="The room the enclosure stands in, by day."
            />
            <UnitToggle quantity="temperature" />
          </div>
        </div>
        {props.chooseKeeper && (
          // Searched as one types: the page never carries the organisation's whole list of people.
          <PersonPicker
            label="Keeper"
            organisationId={props.organisationId}
            people="members"
            value={keeper}
            onChange={setKeeper}
            clearable
            placeholder="Me (the organisation’s own animal)"
            hint="Type part of a name or e-mail; leave it empty to keep it yourself."
            error={fieldError('keeperId')}
          />
        )}
        <Field
          label="Enclosure name"
          placeholder={chosen ? `${chosen.commonName} enclosure` : 'e.g. Desert vivarium'}
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={fieldError('name')}
        />
        <Field
          label="Animal’s name (optional)"
          value={animalName}
          onChange={(e) => setAnimalName(e.target.value)}
          error={fieldError('animalName')}
        />
        <div className="flex gap-2 sm:col-span-2">
          <button type="submit" className={button.primary} disabled={pending}>
            {pending && !proposal
              ? 'Searching the catalogue…'
              : proposal
                ? 'Propose again'
                : 'Propose a set-up'}
          </button>
        </div>
      </form>

      {proposal && (
        <section aria-label="Proposed set-up" className="space-y-6">
          <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
            <div className="space-y-4">
              <h2 className="text-title text-basalt-900">Proposed set-up</h2>
              <ProposalSketch
                design={proposal.design}
                label={`Proposed set-up for ${proposal.sheet.commonName}`}
              />
              {proposal.blocked && (
                <Notice tone="error" title="Not safe to build">
                  {proposal.blocked}
                </Notice>
              )}
              <dl className="space-y-3">
                {proposal.explanation.map((l, i) => (
                  <div
                    key={i}
                    className={
                      l.heading.startsWith('Not met')
                        ? 'rounded-md border border-sand-300 bg-sand-50 p-3'
                        : ''
                    }
                  >
                    <dt className="font-semibold text-basalt-900">{l.heading}</dt>
                    <dd className="text-body text-basalt-800">{l.text}</dd>
                  </div>
                ))}
              </dl>
              <div className="flex flex-wrap gap-2">
                {!proposal.blocked && (
                  <button type="button" className={button.primary} onClick={create} disabled={pending}>
                    {pending ? 'Creating…' : 'Create the enclosure and open it in the studio'}
                  </button>
                )}
                <button type="button" className={button.secondary} onClick={edit} disabled={pending}>
                  Change the answers
                </button>
              </div>
              <p className="text-caption text-basalt-500">
                A starting point: move the perch, change lamps and compare variants in the studio. Nothing is
                bought or built from this — check it with a UV meter and a thermometer.
              </p>
            </div>
            <CautionList design={proposal.design} assessment={proposal.assessment} />
          </div>
          <FindingList
            assessment={proposal.assessment}
            sources={proposal.sheet.sources}
            speciesName={proposal.sheet.commonName}
          />
        </section>
      )}
    </div>
  );
}
