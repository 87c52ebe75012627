/**
 * What the guided start says when the best design it found could still hurt the animal (a lamp within
 * reach, UV close to the eyes, a surface hotter than the species' range, UV above its zone): it will not
 * offer that design, and says why and what to change.
 */
export function blockedMessage(speciesName: string, harmful: { title: string }[]): string {
  return (
    `No set-up from your lamp catalogue keeps a ${speciesName} safe in this enclosure: the best one still fails ` +
    `${harmful.map((f) => `“${f.title}”`).join(', ')}. The guided start will not propose a design that could hurt the animal. ` +
    'Try a taller or larger enclosure (so the lamps can stand further from where it climbs or basks), other lamp types in ' +
    'the catalogue (a lower-wattage heat lamp, a weaker UV lamp), or plan it in the studio with a vet or an experienced keeper.'
  );
}
