// Seeds (or grows) the scale benchmark's example organisation in the database named by DB_NAME; run by
// `npm run bench:scale` (scripts/bench-scale.mjs) against a database of its own. Last line is JSON.
//   --enclosures N --lamps N --readings N --designs N   how many rows to add (default: the default size)
//   --into ID --email E --offset N   add to organisation ID (whose owner signs in as E) after N enclosures
//   --find   add nothing: print the organisation an earlier run made, its owner and its size
import { parseArgs } from 'node:util';
import { closeSequelize, getSequelize } from '@/lib/db';
import {
  addToOrganisation,
  createScaleOrganisation,
  findScaleOrganisation,
  DEFAULT_SCALE_SIZE,
  SCALE_OWNER_PASSWORD,
  type ScaleOrganisation,
} from './lib/scale-org';

const { values } = parseArgs({
  options: {
    enclosures: { type: 'string', default: String(DEFAULT_SCALE_SIZE.enclosures) },
    lamps: { type: 'string', default: String(DEFAULT_SCALE_SIZE.lamps) },
    readings: { type: 'string', default: String(DEFAULT_SCALE_SIZE.readings) },
    designs: { type: 'string', default: String(DEFAULT_SCALE_SIZE.designs) },
    into: { type: 'string' },
    email: { type: 'string' },
    offset: { type: 'string', default: '0' },
    label: { type: 'string', default: 'scale benchmark' },
    find: { type: 'boolean', default: false },
  },
});

const count = (name: keyof typeof values) => {
  const n = Number(values[name]);
  if (!Number.isInteger(n) || n < 0) throw new Error(`--${name} needs a whole number, not ${values[name]}`);
  return n;
};

async function main() {
  const sequelize = getSequelize();
  if (values.find) {
    const found = await findScaleOrganisation(sequelize);
    if (!found) throw new Error('no scale benchmark organisation in this database: run without --reuse');
    console.log(JSON.stringify(found));
    return;
  }
  const t0 = performance.now();
  const org: ScaleOrganisation = values.into
    ? { organisationId: count('into'), ownerEmail: values.email ?? '', ownerPassword: SCALE_OWNER_PASSWORD }
    : await createScaleOrganisation(values.label!);
  const added = await addToOrganisation(
    sequelize,
    org,
    {
      enclosures: count('enclosures'),
      lamps: count('lamps'),
      readings: count('readings'),
      designs: count('designs'),
    },
    { offset: count('offset') },
  );
  console.log(JSON.stringify({ ...org, added, seconds: (performance.now() - t0) / 1000 }));
}

main()
  .catch((e: unknown) => {
    console.error(e instanceof Error ? (e.stack ?? e.message) : e);
    process.exitCode = 1;
  })
  .finally(() => closeSequelize());
