/**
 * The inside sizes an enclosure may have, in centimetres, for every schema that takes them (the enclosure
 * API, the design file, the forms). Below a centimetre nothing can live or be lit, and a value such as
 * 1e-320 would be stored as 0; above the maximum the engine's grid and the drawings stop making sense.
 * The guided start asks a narrower range of its own.
 */
export const ENCLOSURE_MIN_CM = 1;
/** The design file's enclosure (the engine's grid): 10 m a side. */
export const DESIGN_ENCLOSURE_MAX_CM = 1000;
/** The enclosure record (a room-sized habitat can be recorded; its design is limited as above). */
export const ENCLOSURE_MAX_CM = 2000;
