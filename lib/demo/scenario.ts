// The demo scenario: an invented reptile shop with its people and customers' enclosures, and an invented
// household. Every name, address and measurement here is made up for demonstration.
import type { Role } from '@/models';

/** One documented password per role, so the sign-ins are easy to remember and to print. */
export const DEMO_PASSWORDS = {
  owner: 'demo-owner-pass',
  staff: 'demo-staff-pass',
  keeper: 'demo-keeper-pass',
} as const satisfies Record<Role, string>;

export type DemoEnclosure = {
  name: string;
  widthCm: number;
  heightCm: number;
  depthCm: number;
  speciesName: string;
  animalName: string;
  notes: string;
};

export type DemoPerson = {
  email: string;
  name: string;
  role: Role;
  enclosures?: DemoEnclosure[];
};

export type DemoOrganisation = {
  /** Organisation names are how the seed finds them again: keep them unique. */
  name: string;
  kind: 'shop' | 'household';
  people: DemoPerson[];
};

export const DEMO_SHOP: DemoOrganisation = {
  name: 'Fernhollow Reptile Rooms',
  kind: 'shop',
  people: [
    { email: 'maren.tollfield@example.com', name: 'Maren Tollfield', role: 'owner' },
    { email: 'idris.penhallow@example.com', name: 'Idris Penhallow', role: 'staff' },
    { email: 'sunniva.brackett@example.com', name: 'Sunniva Brackett', role: 'staff' },
    {
      email: 'tomasz.wrenfield@example.com',
      name: 'Tomasz Wrenfield',
      role: 'keeper',
      enclosures: [
        {
          name: 'Desert vivarium',
          widthCm: 120,
          heightCm: 60,
          depthCm: 60,
          speciesName: 'Bearded dragon',
          animalName: 'Sable',
          notes: 'Wooden vivarium with a glass front. Basking rock on the right, hide on the left.',
        },
        {
          name: 'Gecko tank',
          widthCm: 90,
          heightCm: 45,
          depthCm: 45,
          speciesName: 'Leopard gecko',
          animalName: 'Pip',
          notes: 'Glass tank with a mesh lid; warm hide and humid hide.',
        },
      ],
    },
    {
      email: 'aoife.lindmarr@example.com',
      name: 'Aoife Lindmarr',
      role: 'keeper',
      enclosures: [
        {
          name: 'Snake vivarium',
          widthCm: 120,
          heightCm: 60,
          depthCm: 45,
          speciesName: 'Corn snake',
          animalName: 'Ember',
          notes: 'Branches along the back wall; cool end under a cork bark hide.',
        },
      ],
    },
    {
      email: 'dev.okafor-hale@example.com',
      name: 'Dev Okafor-Hale',
      role: 'keeper',
      enclosures: [
        {
          name: 'Tall mesh cage',
          widthCm: 60,
          heightCm: 120,
          depthCm: 60,
          speciesName: 'Veiled chameleon',
          animalName: 'Juniper',
          notes: 'Screen cage with live plants; lamps rest on the mesh top.',
        },
        {
          name: 'Arboreal terrarium',
          widthCm: 45,
          heightCm: 60,
          depthCm: 45,
          speciesName: 'Crested gecko',
          animalName: 'Moss',
          notes: 'Planted glass terrarium with a mesh top; misted in the evening.',
        },
      ],
    },
  ],
};

export const DEMO_HOUSEHOLD: DemoOrganisation = {
  name: 'Ashgrove household',
  kind: 'household',
  people: [
    {
      email: 'lena.ashgrove@example.com',
      name: 'Lena Ashgrove',
      role: 'owner',
      enclosures: [
        {
          name: 'Python vivarium',
          widthCm: 120,
          heightCm: 60,
          depthCm: 60,
          speciesName: 'Ball python',
          animalName: 'Biscuit',
          notes: 'PVC vivarium; heat from a guarded ceramic emitter, low-output UVB tube.',
        },
      ],
    },
  ],
};

export const DEMO_ORGANISATIONS: readonly DemoOrganisation[] = [DEMO_SHOP, DEMO_HOUSEHOLD];

export type DemoSignIn = { organisation: string; role: Role; name: string; email: string; password: string };

/** Every demo account with its password, shop first, owners before staff before keepers. */
export const DEMO_SIGN_INS: readonly DemoSignIn[] = DEMO_ORGANISATIONS.flatMap((org) =>
  org.people.map((p) => ({
    organisation: org.name,
    role: p.role,
    name: p.name,
    email: p.email,
    password: DEMO_PASSWORDS[p.role],
  })),
);

/** The demo account of a role (the first one), for tests: `demoSignIn('staff')`. */
export function demoSignIn(role: Role, organisation: string = DEMO_SHOP.name): DemoSignIn {
  const found = DEMO_SIGN_INS.find((s) => s.role === role && s.organisation === organisation);
  if (!found) throw new Error(`no demo ${role} in ${organisation}`);
  return found;
}
