// Written by `npm run units:derive` from mathjs's unit system (shared/units/derive.ts) — do not edit by hand.
// shared/units/registry.test.ts fails when these differ from what mathjs derives.
import type { Derived } from './derive';

export const DERIVED: Derived = {
  icePointK: 273.15,
  quantities: {
    length: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 0.3048,
        origin: 0,
      },
      also: {},
    },
    shortLength: {
      SI: {
        scale: 0.001,
        origin: 0,
      },
      IP: {
        scale: 0.0254,
        origin: 0,
      },
      also: {
        m: {
          scale: 1,
          origin: 0,
        },
        ft: {
          scale: 0.3048,
          origin: 0,
        },
      },
    },
    area: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 0.09290304,
        origin: 0,
      },
      also: {},
    },
    volume: {
      SI: {
        scale: 0.001,
        origin: 0,
      },
      IP: {
        scale: 0.003785411784,
        origin: 0,
      },
      also: {},
    },
    temperature: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 0.5555555555555556,
        origin: 32,
      },
      also: {},
    },
    temperatureDifference: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 0.5555555555555556,
        origin: 0,
      },
      also: {},
    },
    expansion: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 1.7999999999999998,
        origin: 0,
      },
      also: {},
    },
    resistance: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 0.17611018368230588,
        origin: 0,
      },
      also: {},
    },
    transmittance: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 5.678263341113487,
        origin: 0,
      },
      also: {},
    },
    conductivity: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 0.14422788886428256,
        origin: 0,
      },
      also: {},
    },
    psi: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 1.7307346663713907,
        origin: 0,
      },
      also: {},
    },
    chi: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 0.52752792631,
        origin: 0,
      },
      also: {},
    },
    pressure: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 47.88025898033584,
        origin: 0,
      },
      also: {
        kPa: {
          scale: 1000,
          origin: 0,
        },
        psi: {
          scale: 6894.757293168362,
          origin: 0,
        },
      },
    },
    vapourPermeance: {
      SI: {
        scale: 1.0000000000000002e-12,
        origin: 0,
      },
      IP: {
        scale: 5.74525e-11,
        origin: 0,
      },
      also: {
        perm0C: {
          scale: 5.7213494670945093e-11,
          origin: 0,
        },
      },
    },
    force: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 4.4482216152605,
        origin: 0,
      },
      also: {},
    },
    forcePerLength: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 14.593902937206362,
        origin: 0,
      },
      also: {},
    },
    massPerArea: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 4.882427636383051,
        origin: 0,
      },
      also: {
        gPerM2: {
          scale: 0.001,
          origin: 0,
        },
        ozPerFt2: {
          scale: 0.3051517272739407,
          origin: 0,
        },
      },
    },
    speed: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 0.44704,
        origin: 0,
      },
      also: {},
    },
    density: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 16.018463373960138,
        origin: 0,
      },
      also: {},
    },
    ventArea: {
      SI: {
        scale: 1,
        origin: 0,
      },
      IP: {
        scale: 2116.6666666666665,
        origin: 0,
      },
      also: {},
    },
  },
};
