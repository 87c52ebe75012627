import type { SpeciesSheet as EngineSpeciesSheet } from '@/simulation';
import type { SpeciesInput } from './schema';

type SheetNeeds = Pick<
  SpeciesInput,
  'commonName' | 'uvZone' | 'baskingSurfaceC' | 'coolAirC' | 'nightMinC' | 'uvbTargetUw'
> &
  Partial<Pick<SpeciesInput, 'adultLengthCm' | 'climbs' | 'lowMelanin' | 'photoperiodH'>>;

/** What the engine's assessment needs from a sheet: the cool side's air range is its cool-end target. */
export function toEngineSheet(s: SheetNeeds): EngineSpeciesSheet {
  const sheet: EngineSpeciesSheet = {
    name: s.commonName,
    uvZone: s.uvZone as 1 | 2 | 3 | 4,
    baskingSurfaceC: [s.baskingSurfaceC.min, s.baskingSurfaceC.max],
    coolEndC: [s.coolAirC.min, s.coolAirC.max],
  };
  if (s.nightMinC !== null) sheet.nightMinC = s.nightMinC;
  if (s.uvbTargetUw) sheet.uvbTargetUw = [s.uvbTargetUw.min, s.uvbTargetUw.max];
  if (s.adultLengthCm) sheet.adultLengthCm = s.adultLengthCm;
  if (s.climbs) sheet.climbs = true;
  if (s.lowMelanin) sheet.lowMelanin = true;
  if (s.photoperiodH) sheet.photoperiodH = [s.photoperiodH.min, s.photoperiodH.max];
  return sheet;
}
