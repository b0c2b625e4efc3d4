// Two projects: plain node for the pure shared code and the server, jest-expo for React Native components.
const moduleNameMapper = { '^@/(.*)$': '<rootDir>/$1' };

module.exports = {
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
