import bcrypt from 'bcryptjs';

describe('passwords', () => {
  afterEach(() => jest.restoreAllMocks());

  function load(): typeof import('../../../server/auth/passwords') {
    let loaded!: typeof import('../../../server/auth/passwords');
    jest.isolateModules(() => {
      loaded = require('../../../server/auth/passwords');
    });
    return loaded;
  }

  it('verifies the right password and refuses a wrong one and an unknown account', async () => {
    const { passwords } = load();
    const hash = await passwords.hash('correct horse');
    expect(await passwords.verify('correct horse', hash)).toBe(true);
    expect(await passwords.verify('wrong horse', hash)).toBe(false);
    expect(await passwords.verify('correct horse', undefined)).toBe(false);
  });

  it('hashes nothing when loaded, and makes the decoy for unknown accounts once, at the first sign-in', async () => {
    let spies!: { hash: jest.SpyInstance; hashSync: jest.SpyInstance };
    let loaded!: typeof import('../../../server/auth/passwords');
    jest.isolateModules(() => {
      // The module's own bcryptjs: isolateModules gives the passwords module a fresh registry.
      const own: typeof bcrypt = require('bcryptjs');
      spies = { hash: jest.spyOn(own, 'hash'), hashSync: jest.spyOn(own, 'hashSync') };
      loaded = require('../../../server/auth/passwords');
    });
    expect(spies.hash).not.toHaveBeenCalled();
    expect(spies.hashSync).not.toHaveBeenCalled();
    const known = await bcrypt.hash('x', 4);
    await loaded.passwords.verify('x', known);
    await loaded.passwords.verify('x', undefined);
    await loaded.passwords.verify('y', undefined);
    expect(spies.hash).toHaveBeenCalledTimes(1);
    expect(spies.hashSync).not.toHaveBeenCalled();
  });

  it("hashes at cost 11 outside jest, and at bcrypt's minimum of 4 under it", async () => {
    const { passwords, BCRYPT_COST, PRODUCTION_BCRYPT_COST } = load();
    expect(PRODUCTION_BCRYPT_COST).toBe(11);
    expect(BCRYPT_COST).toBe(4);
    expect(bcrypt.getRounds(await passwords.hash('x'))).toBe(4);
    const saved = process.env.NODE_ENV;
    process.env.NODE_ENV = 'production';
    try {
      const real = load();
      expect(real.BCRYPT_COST).toBe(11);
      expect(bcrypt.getRounds(await real.passwords.hash('x'))).toBe(11);
    } finally {
      process.env.NODE_ENV = saved;
    }
  });
});
