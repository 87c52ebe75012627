// Session state: everything about how the user is looking at and working on the design that is
// NOT part of the saved document (and therefore not undoable): tool, selection, camera, view options.
import type { Camera, Point, Rect, Viewport } from '../geometry/camera';
import type { Guide } from '../geometry/snap';
import type { LengthUnit, TempUnit } from '@/shared/units';
import { CM_PER_IN } from '@/shared/units';
import { OBJECT_TYPES, type ObjectType, type StudioCatalogueType } from './types';

export type PlaceTool = ObjectType;
export type Tool = 'select' | 'pan' | PlaceTool | 'probe' | 'ruler';
export type FieldView = 'uvb' | 'uvi' | 'tempC';
export type SideTab = 'inspect' | 'fields' | 'assess';

/** One photo of the enclosure the user may read (uploaded on the enclosure's lamps page). */
export interface EnclosurePhoto {
  id: number;
  name: string;
  /** Served by the upload's own route, which checks access again. */
  url: string;
}

/** The enclosure's photos for the backdrop; null in a studio without an enclosure (the scratch studio). */
export interface EnclosurePhotos {
  items: EnclosurePhoto[];
  /** Where photos of this enclosure are uploaded. */
  uploadHref: string;
}

/** Whether the backdrop's photo could be drawn: `unavailable` = deleted, or not this user's to see. */
export type BackdropImageState = 'loading' | 'ready' | 'unavailable';

export interface Session {
  tool: Tool;
  /** Ids of selected objects and pinned probes. */
  selection: string[];
  camera: Camera;
  viewport: Viewport;
  /** Whether the camera has been fitted to the design once the viewport size was known. */
  fitted: boolean;
  fieldsVisible: boolean;
  field: FieldView;
  fieldOpacity: number;
  lengthUnit: LengthUnit;
  tempUnit: TempUnit;
  snapGrid: boolean;
  snapSurfaces: boolean;
  /** Ageing preview: months added to every lamp's age. */
  addMonths: number;
  speciesId: string | null;
  /** Finding whose location is highlighted on the canvas. */
  highlight: string | null;
  helpOpen: boolean;
  tab: SideTab;
  /** Narrow screens: the side panels' sheet is open (wide screens always show them). */
  panelOpen: boolean;
  /** The actions menu opened by a long press or a right click, at a stage point, for an object or none. */
  actionsMenu: { at: Point; objectId: string | null } | null;
  /** Snap guides shown while dragging. */
  guides: Guide[];
  ruler: { a: Point; b: Point } | null;
  marquee: Rect | null;
  photos: EnclosurePhotos | null;
  /** The organisation's catalogue types with an adopted measured curve; empty without an organisation. */
  catalogueTypes: StudioCatalogueType[];
  /** Adjusting the photo: pointer drags on the canvas move it and stretch it by its corners. */
  backdropAdjust: boolean;
  backdropImage: { uploadId: number; state: BackdropImageState } | null;
}

export function initialSession(): Session {
  return {
    tool: 'select',
    selection: [],
    camera: { zoom: 5, originX: 60, originY: 400 },
    viewport: { width: 800, height: 500 },
    fitted: false,
    fieldsVisible: true,
    field: 'uvi',
    fieldOpacity: 0.75,
    lengthUnit: 'cm',
    tempUnit: 'C',
    snapGrid: true,
    snapSurfaces: true,
    addMonths: 0,
    speciesId: null,
    highlight: null,
    helpOpen: false,
    tab: 'inspect',
    panelOpen: false,
    actionsMenu: null,
    guides: [],
    ruler: null,
    marquee: null,
    photos: null,
    catalogueTypes: [],
    backdropAdjust: false,
    backdropImage: null,
  };
}

/** Grid/snap step in cm: 1 cm, or half an inch when working in inches. */
export function gridStepCm(unit: LengthUnit): number {
  return unit === 'cm' ? 1 : CM_PER_IN / 2;
}

/** One tool a kind of object, in the registry's order. */
export const PLACE_TOOLS: readonly PlaceTool[] = OBJECT_TYPES;

export function isPlaceTool(t: Tool): t is PlaceTool {
  return (PLACE_TOOLS as readonly string[]).includes(t);
}

/** Preferences worth keeping between visits (units, field view); the rest starts fresh. */
export type StoredPrefs = Pick<
  Session,
  'lengthUnit' | 'tempUnit' | 'field' | 'fieldOpacity' | 'fieldsVisible' | 'snapGrid' | 'snapSurfaces'
>;

export function pickPrefs(s: Session): StoredPrefs {
  return {
    lengthUnit: s.lengthUnit,
    tempUnit: s.tempUnit,
    field: s.field,
    fieldOpacity: s.fieldOpacity,
    fieldsVisible: s.fieldsVisible,
    snapGrid: s.snapGrid,
    snapSurfaces: s.snapSurfaces,
  };
}
