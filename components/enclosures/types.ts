/** What the enclosure screens get from the server (plain data, safe to pass to client components). */
export type EnclosureView = {
  id: number;
  name: string;
  keeperId: number;
  keeperName: string | null;
  widthCm: number;
  heightCm: number;
  depthCm: number;
  speciesName: string | null;
  animalName: string | null;
  notes: string | null;
  updatedAt: string;
};

export type PersonOption = { id: number; name: string; role: string };
