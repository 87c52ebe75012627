/**
 * The standing cautions shown with every shared design and report. Our own wording; the subjects are
 * the usual hazards of lighting and heating an enclosure (UV injury, burns, fire, thermostats).
 */
export const ESTIMATE_NOTE =
  'Every figure here is an estimate from a model — verify with a UV meter and a thermometer in the enclosure before relying on it.';

export const CAUTIONS: { title: string; text: string }[] = [
  {
    title: 'UV can injure eyes and skin',
    text: 'Ultraviolet light harms the eyes and skin of animals and people. Never look into a UV lamp, keep basking UV within the species’ range, and always leave shade with no UV to retreat to.',
  },
  {
    title: 'Burns',
    text: 'Animals are burned by lamps they can reach and by surfaces that get too hot. Guard lamps or mount them outside the enclosure, and measure the hottest surface with a thermometer.',
  },
  {
    title: 'Fire',
    text: 'Lamps and fittings get hot. Use fittings rated for the lamp’s wattage, keep lamps clear of substrate, plants and anything they could scorch, and follow local electrical codes.',
  },
  {
    title: 'Thermostats',
    text: 'Run every heat source through a suitable thermostat, with the probe where the animal basks, and check it regularly.',
  },
  {
    title: 'Ask a vet',
    text: 'For an animal’s health, defer to a reptile-experienced vet; for wiring and installation, to local codes and licensed practice.',
  },
];
