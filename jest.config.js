// Two projects: plain node for the pure shared code and the server, jest-expo for React Native components.
const moduleNameMapper = { '^@/(.*)$': '<rootDir>/$1' };

module.exports = {
  // A shared two-core CI machine can take seconds to render a screen the first time; the tests assert
  // behaviour, never speed (speed lives in npm run bench).
  testTimeout: 30000,
  projects: [
    {
      displayName: 'node',
      testEnvironment: 'node',
      roots: ['<rootDir>/tests'],
      testPathIgnorePatterns: ['/tests/components/', '/tests/e2e/', '/tests/bench/'],
      testMatch: ['**/*.test.ts'],
      transform: { '^.+\\.[jt]sx?$': ['babel-jest', { presets: ['babel-preset-expo'] }] },
      transformIgnorePatterns: ['/node_modules/(?!(@dagrejs)/)'],
      moduleNameMapper,
    },
    {
      displayName: 'components',
      preset: 'jest-expo',
      roots: ['<rootDir>/tests/components'],
      testMatch: ['**/*.test.tsx'],
      moduleNameMapper,
    },
  ],
};
