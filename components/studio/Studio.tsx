'use client';
// The design studio: toolbar, palette, canvas, side panels and status bar around one store.
// Client-only (Konva); load it through StudioLoader, which imports it with ssr: false.
import dynamic from 'next/dynamic';
import { useEffect, useId, useMemo, useState } from 'react';
import type { CommandContext } from './commands/registry';
import type { HighlightShape } from './canvas/Overlay';
import type { PointerInfo } from './canvas/StudioCanvas';
import { useBands } from './fields/useBands';
import { useSimulation } from './fields/useSimulation';
import { StudioContext, useStudio } from './hooks/useStudio';
import { useShortcuts } from './hooks/useShortcuts';
import { useBackdropImage } from './hooks/useBackdropImage';
import { TABLET_QUERY, WIDE_QUERY, useMediaQuery } from './hooks/useMediaQuery';
import {
  ConflictBanner,
  RestoreBanner,
  SafetyBanner,
  SAFETY_FINDINGS,
  ViewOnlyBanner,
} from './panels/Banners';
import { ActionsMenu } from './panels/ActionsMenu';
import { CanvasLegend } from './panels/CanvasLegend';
import { HelpDialog } from './panels/HelpDialog';
import { ObjectSummary } from './panels/ObjectSummary';
import { Palette } from './panels/Palette';
import { SidePanel } from './panels/SidePanel';
import { StatusBar } from './panels/StatusBar';
import { Toolbar } from './panels/Toolbar';
import type { KeyValueStorage, Loaded, StudioPersistence } from './persistence/types';
import { designFileName, downloadDesign } from './persistence/download';
import { useAutosave } from './persistence/useAutosave';
import { createAtom } from './state/atom';
import { pickPrefs, type EnclosurePhotos, type StoredPrefs } from './state/session';
import { StudioStore } from './state/store';
import type { Design, StudioCatalogueType, StudioSpecies } from './state/types';
import { climberMeshRisks, samePhysics } from '@/simulation';
import { formatStudioView, STUDIO_VIEW_COOKIE } from '@/shared/designs/studio-view-cookie';
import type { StudioPicture } from '@/shared/designs/studio-field';
import { FirstFieldPicture } from './FirstField';
import type { Traced } from './fields/useBands';

// While Konva loads, the page's picture of the field (drawn under the canvas's place) stays visible.
const StudioCanvas = dynamic(() => import('./canvas/StudioCanvas'), { ssr: false, loading: () => null });

const PREFS_KEY = 'baskwell.studio.prefs';
// The cm/in and °C/°F choices of the rest of the app (components/ui/units.ts): one choice everywhere.
const APP_LENGTH_KEY = 'baskwell.lengthUnit';
const APP_TEMP_KEY = 'baskwell.tempUnit';

function readPrefs(storage: KeyValueStorage): Partial<StoredPrefs> {
  try {
    const raw = storage.getItem(PREFS_KEY);
    const p = raw ? (JSON.parse(raw) as Partial<StoredPrefs>) : {};
    const out: Partial<StoredPrefs> = {};
    const appLength = storage.getItem(APP_LENGTH_KEY);
    if (appLength === 'cm' || appLength === 'in') out.lengthUnit = appLength;
    else if (p.lengthUnit === 'cm' || p.lengthUnit === 'in') out.lengthUnit = p.lengthUnit;
    const appTemp = storage.getItem(APP_TEMP_KEY);
    if (appTemp === 'C' || appTemp === 'F') out.tempUnit = appTemp;
    else if (p.tempUnit === 'C' || p.tempUnit === 'F') out.tempUnit = p.tempUnit;
    if (p.field === 'uvb' || p.field === 'uvi' || p.field === 'tempC') out.field = p.field;
    if (typeof p.fieldOpacity === 'number' && p.fieldOpacity >= 0.1 && p.fieldOpacity <= 1)
      out.fieldOpacity = p.fieldOpacity;
    for (const k of ['fieldsVisible', 'snapGrid', 'snapSurfaces'] as const)
      if (typeof p[k] === 'boolean') out[k] = p[k];
    return out;
  } catch {
    return {};
  }
}

export interface StudioProps {
  persistence: StudioPersistence;
  species: StudioSpecies[];
  title: string;
  backHref?: string;
  backLabel?: string;
  /** Design and version loaded on the server; without it the studio loads through `persistence`. */
  initial?: Loaded;
  initialSpeciesId?: string | null;
  /** View only: the design can be inspected, probed and checked but not changed. */
  readOnly?: boolean;
  storage?: KeyValueStorage;
  /** The enclosure's photos this user may see, for the backdrop; absent without an enclosure. */
  photos?: EnclosurePhotos;
  /** The organisation's catalogue types with an adopted measured curve (variant studios only). */
  catalogueTypes?: StudioCatalogueType[];
  /** The field the server drew for `design`, shown until the engine's first answer (same bands). */
  picture?: (StudioPicture & { design: Design }) | null;
}

export default function Studio(props: StudioProps) {
  const [loaded, setLoaded] = useState<Loaded | null>(props.initial ?? null);
  const [error, setError] = useState<string | null>(null);
  const [attempt, setAttempt] = useState(0);
  const { persistence, initial } = props;
  useEffect(() => {
    if (initial) return;
    let live = true;
    persistence.load().then(
      (l) => live && setLoaded(l),
      (e: unknown) => live && setError(e instanceof Error ? e.message : 'The design could not be loaded.'),
    );
    return () => {
      live = false;
    };
  }, [persistence, initial, attempt]);
  if (loaded) return <StudioEditor {...props} loaded={loaded} />;
  return (
    // No background of its own while loading: the page's picture of the field shows through.
    <div className={`flex h-full items-center justify-center ${error ? 'bg-basalt-50' : ''}`} role="status">
      {error ? (
        <div className="max-w-md rounded-lg border border-ember-200 bg-white p-5 text-sm">
          <p className="font-semibold text-ember-800">The design could not be loaded.</p>
          <p className="mt-1 text-basalt-700">{error}</p>
          <button
            type="button"
            className="mt-3 rounded-md bg-basalt-800 px-3 py-1.5 text-white focus-visible:outline focus-visible:outline-2 focus-visible:outline-sky-600"
            onClick={() => {
              setError(null);
              setAttempt((n) => n + 1);
            }}
          >
            Try again
          </button>
        </div>
      ) : (
        <p className="rounded-md bg-white/90 px-3 py-1 text-basalt-600">Loading the design…</p>
      )}
    </div>
  );
}

function StudioEditor({
  persistence,
  species,
  title,
  backHref,
  backLabel,
  loaded,
  initialSpeciesId,
  readOnly = false,
  storage: storageProp,
  photos,
  catalogueTypes,
  picture,
}: StudioProps & { loaded: Loaded }) {
  const storage = useMemo(() => storageProp ?? window.localStorage, [storageProp]);
  const [store] = useState(
    () =>
      new StudioStore(
        loaded.design,
        {
          ...readPrefs(storage),
          speciesId: initialSpeciesId ?? (species.length === 1 ? species[0]!.id : null),
          photos: photos ?? null,
          catalogueTypes: catalogueTypes ?? [],
        },
        { readOnly },
      ),
  );
  const pointer = useMemo(() => createAtom<PointerInfo | null>(null), []);
  const save = useAutosave(store, persistence, loaded, storage);
  const ctx = useMemo<CommandContext>(() => ({ store, saveNow: save.saveNow }), [store, save.saveNow]);
  useShortcuts(ctx);
  // A refused save (signed out, access withdrawn) turns the studio view-only until a save succeeds again.
  const refused = save.state.kind === 'refused' ? save.state.reason : null;
  const viewOnly = readOnly || refused !== null;
  // A phone opens a design for looking at: a thumb resting on the screen must not move a lamp. The Edit
  // switch turns editing on (and off again); tablets and wider screens start with it on.
  const tablet = useMediaQuery(TABLET_QUERY);
  const wide = useMediaQuery(WIDE_QUERY);
  const panelOpen = useStudio(store, (s) => s.session.panelOpen);
  const [viewing, setViewing] = useState(() => !window.matchMedia(TABLET_QUERY).matches);
  const switchable = !viewOnly && (viewing || !tablet);
  useEffect(() => store.setReadOnly(viewOnly || viewing), [store, viewOnly, viewing]);

  // The server's picture stands in for the first answer only if it shows what the studio will: the same
  // physics (a scratch design of this browser's own differs from the example) and the chosen field.
  const [firstBands] = useState<Traced | null>(() =>
    picture &&
    store.session.fieldsVisible &&
    store.session.field === picture.field &&
    samePhysics(picture.design, loaded.design)
      ? { field: picture.field, thresholds: picture.thresholds, bands: picture.bands }
      : null,
  );

  // Units and view preferences are remembered on this device.
  const prefs = useStudio(store, (s) => JSON.stringify(pickPrefs(s.session)));
  useEffect(() => {
    try {
      storage.setItem(PREFS_KEY, prefs);
      const chosen = JSON.parse(prefs) as StoredPrefs;
      // The field choice also goes to the server, which draws that field into the next studio page.
      const view = chosen.fieldsVisible
        ? formatStudioView({ field: chosen.field, opacity: chosen.fieldOpacity })
        : formatStudioView({ field: null });
      document.cookie = `${STUDIO_VIEW_COOKIE}=${view}; path=/; max-age=31536000; samesite=lax`;
      storage.setItem(APP_LENGTH_KEY, chosen.lengthUnit);
      storage.setItem(APP_TEMP_KEY, chosen.tempUnit);
    } catch {
      // Preferences are a convenience; ignore a full or disabled storage.
    }
  }, [prefs, storage]);
  const field = useStudio(store, (s) => s.session.field);
  const tempUnit = useStudio(store, (s) => s.session.tempUnit);
  const fieldsVisible = useStudio(store, (s) => s.session.fieldsVisible);
  const highlightId = useStudio(store, (s) => s.session.highlight);

  const sim = useSimulation(store, species);
  const speciesId = useStudio(store, (s) => s.session.speciesId);
  // A finding that holds only if the animal climbs (no sheet chosen) is listed under Check, not raised
  // as a banner over every design with a lamp resting on its mesh lid.
  const safety = (sim.assessment?.findings ?? []).filter(
    (f) => SAFETY_FINDINGS.has(f.id) && f.status !== 'pass' && !f.ifClimbs,
  );
  const { bands, legend } = useBands(sim.grid, field, tempUnit, fieldsVisible, firstBands);
  const highlighted = useMemo(() => {
    const f = sim.assessment?.findings.find((x) => x.id === highlightId);
    if (!f?.where) return null;
    const shape: HighlightShape =
      f.where.kind === 'segments'
        ? { segments: f.where.segments, objectIds: [] }
        : { segments: [], objectIds: f.where.objectIds };
    return { findingId: f.id, title: f.title, shape };
  }, [sim.assessment, highlightId]);
  const highlight = highlighted?.shape ?? null;
  const basking = sim.assessment?.findings.find((f) => f.id === 'shared-basking');
  const zones = basking?.basking;
  const markKinds = useMemo(
    () => (zones ? (['uv', 'heat', 'both'] as const).filter((k) => zones[k].length > 0) : []),
    [zones],
  );
  // A climbing species holds on to every mesh: each is marked with the lamps that make it a risk.
  const climbs = species.find((s) => s.id === speciesId)?.climbs === true;
  const designNow = useStudio(store, (s) => s.history.present);
  const meshRisks = useMemo(() => (climbs ? climberMeshRisks(designNow) : null), [climbs, designNow]);
  const summaryId = useId();
  const photo = useBackdropImage(store);

  return (
    <StudioContext.Provider value={ctx}>
      <div className="flex h-full min-h-0 flex-col bg-basalt-50 text-basalt-900" data-testid="studio">
        <Toolbar
          title={title}
          backHref={backHref}
          backLabel={backLabel}
          editSwitch={switchable ? { on: !viewing, onChange: (on) => setViewing(!on) } : undefined}
        />
        {viewOnly && (
          <ViewOnlyBanner
            refused={refused}
            signInHref={`/sign-in?callbackUrl=${encodeURIComponent(window.location.pathname)}`}
            onDownload={() => downloadDesign(store.design, designFileName(title, 'unsaved-changes'))}
            onRetry={save.saveNow}
          />
        )}
        {save.offer && !viewOnly && (
          <RestoreBanner savedAt={save.offer.savedAt} onRestore={save.restore} onDiscard={save.discard} />
        )}
        {save.state.kind === 'conflict' && (
          <ConflictBanner onKeepMine={save.keepMine} onTakeTheirs={save.takeTheirs} />
        )}
        {safety.length > 0 && (
          <SafetyBanner findings={safety} onShow={(id) => store.setSession({ highlight: id })} />
        )}
        {/* Canvas first: wide screens put the palette and the panels beside it, narrower ones a bar of
            tools above it and the panels in a sheet below it. */}
        <div className="flex min-h-0 flex-1 flex-col lg:flex-row">
          <Palette />
          <main className="relative min-h-0 min-w-0 flex-1" aria-label="Canvas">
            {firstBands && picture && !sim.grid && (
              <FirstFieldPicture
                design={picture.design}
                picture={{ ...picture, opacity: store.session.fieldOpacity }}
              />
            )}
            <StudioCanvas
              store={store}
              pointer={pointer}
              grid={sim.grid}
              bands={bands}
              probeReadings={sim.probeReadings}
              highlight={highlight}
              summaryId={summaryId}
              photo={photo}
              basking={basking}
              meshRisks={meshRisks}
            />
            <ObjectSummary id={summaryId} highlight={highlighted} basking={basking} meshRisks={meshRisks} />
            {/* Under an open sheet the canvas is short: the Fields tab has the legend then. */}
            {fieldsVisible && !(panelOpen && !wide) && (
              <CanvasLegend field={field} temp={tempUnit} legend={legend} marks={markKinds} />
            )}
            <ActionsMenu
              viewOnlyNote={viewing && !viewOnly ? 'View only: turn on Edit to change it.' : 'View only.'}
            />
          </main>
          <SidePanel sim={sim} legend={legend} species={species} />
        </div>
        <StatusBar
          save={save.state}
          onSaveNow={save.saveNow}
          pointer={pointer}
          sim={sim}
          savedWhere={persistence.where}
        />
        <HelpDialog />
      </div>
    </StudioContext.Provider>
  );
}
