/**
 * Which unit a UV need is judged in, and the texts that say so. A species' UV need is its Ferguson
 * zone's UV Index range (Ferguson et al. 2010, Zoo Biology 29:317–334): UV Index weighs each wavelength
 * by its effect on skin, so it is the same need under any lamp. A broadband µW/cm² figure is not: UV
 * Index per µW/cm² differs several-fold between lamp spectra, and broadband meters differ in spectral
 * response. So a µW/cm² target is only ever derived from the zone through a lamp's ratio, and a sheet's
 * own µW/cm² range is a shop's rule of thumb, shown beside the verdict and never deciding it.
 */
import { isShortWaveRatio, SUNLIGHT_UVI_PER_UVB } from '../sources/uv';

export const RULE_OF_THUMB_LABEL = 'shop rule of thumb';

/** The caveat shown beside every µW/cm² figure. */
export const METER_CAVEAT =
  'Broadband UVB meters differ in spectral response, so a µW/cm² figure only compares with readings of the same meter under the same kind of lamp; a UV Index meter reads the need directly.';

const r2 = (v: number) => (Math.round(v * 1000) / 1000).toString();

/** The caution for a lamp whose UV Index per µW/cm² is far above sunlight's; null when it is not. */
export function shortWaveCaution(uviPerUvb: number, name = 'This lamp'): string | null {
  if (!isShortWaveRatio(uviPerUvb)) return null;
  return (
    `${name} gives about ${r2(uviPerUvb)} UV Index per µW/cm², over twice sunlight’s (about ${SUNLIGHT_UVI_PER_UVB}, from memory): ` +
    'much of its UVB is short-wave, at wavelengths sunlight does not contain, which can inflame the eyes ' +
    '(photokeratoconjunctivitis) and burn the skin at a µW/cm² reading that looks modest. Judge it by UV Index, ' +
    'never by a µW/cm² target; keep to the lamp maker’s distances and ask a reptile-experienced vet if an ' +
    'animal keeps its eyes closed or they look swollen.'
  );
}
