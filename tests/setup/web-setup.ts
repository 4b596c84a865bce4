// Screen tests run under jest-expo/web with @testing-library/react.
// expo-router's Head needs a navigator to know its screen is focused; screens under test have none.
jest.mock('expo-router/head', () => jest.requireActual('./expo-head-stub'));
