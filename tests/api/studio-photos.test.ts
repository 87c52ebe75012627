import { describe, expect, it } from 'vitest';
import { loadUserById } from '@/lib/auth/session-user';
import { studioPhotos } from '@/lib/uploads/studio-photos';
import { Upload, type Enclosure, type User } from '@/models';
import { withTestDatabase } from '../helpers/db';
import { createEnclosureWorld } from '../helpers/world';

// Which photos a variant's studio offers as its backdrop, against the real test database: the
// enclosure's own, and the photo its design names only if this person may still read it. The files
// themselves are not needed (the studio asks the upload's own route for them, which checks again).
withTestDatabase();

let n = 0;
async function photo(
  enclosure: Enclosure,
  owner: User,
  name: string,
  kind: 'backdrop' | 'readings-csv' = 'backdrop',
) {
  n += 1;
  return Upload.create({
    kind,
    ownerId: owner.id,
    organisationId: enclosure.organisationId,
    enclosureId: enclosure.id,
    originalName: name,
    storageKey: `test/${n}`,
    contentType: kind === 'backdrop' ? 'image/png' : 'text/csv',
    sizeBytes: 10,
    sha256: '0'.repeat(64),
  });
}

async function world() {
  const w = await createEnclosureWorld();
  const user = async (u: User) => (await loadUserById(u.id))!;
  return { ...w, outsiderOwner: w.outsider, user };
}

describe('photos offered in the studio', () => {
  it('lists the enclosure’s own photos, newest first, with the page where more are uploaded', async () => {
    const w = await world();
    const older = await photo(w.enclosure, w.keeper, 'side.jpg');
    const newer = await photo(w.enclosure, w.staff, 'front.png');
    await photo(w.enclosure, w.keeper, 'readings.csv', 'readings-csv');
    const r = await studioPhotos(await w.user(w.keeper), w.enclosure, undefined);
    expect(r).toEqual({
      items: [
        { id: newer.id, name: 'front.png', url: `/api/uploads/${newer.id}` },
        { id: older.id, name: 'side.jpg', url: `/api/uploads/${older.id}` },
      ],
      uploadHref: `/enclosures/${w.enclosure.id}/lamps`,
    });
    const none = await studioPhotos(await w.user(w.keeper), w.neighbour, undefined);
    expect(none.items).toEqual([]);
  });

  it('adds the photo a design names from another enclosure only for someone who may read it', async () => {
    const w = await world();
    const neighbours = await photo(w.neighbour, w.otherKeeper, 'neighbour.jpg');
    const foreign = await photo(w.foreign, w.outsiderOwner, 'foreign.jpg');
    // Staff may read the neighbour's enclosure: offered, marked as from another enclosure.
    const staff = await studioPhotos(await w.user(w.staff), w.enclosure, neighbours.id);
    expect(staff.items).toEqual([
      { id: neighbours.id, name: 'neighbour.jpg (another enclosure)', url: `/api/uploads/${neighbours.id}` },
    ]);
    // The keeper may not see another keeper's enclosure, nor anything of another organisation.
    expect((await studioPhotos(await w.user(w.keeper), w.enclosure, neighbours.id)).items).toEqual([]);
    expect((await studioPhotos(await w.user(w.staff), w.enclosure, foreign.id)).items).toEqual([]);
    // A photo that no longer exists.
    expect((await studioPhotos(await w.user(w.staff), w.enclosure, 987654321)).items).toEqual([]);
  });

  it('offers nothing to someone who may not read the enclosure', async () => {
    const w = await world();
    await photo(w.enclosure, w.keeper, 'front.png');
    const r = await studioPhotos(await w.user(w.otherKeeper), w.enclosure, undefined);
    expect(r.items).toEqual([]);
  });
});
