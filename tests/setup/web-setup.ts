// Screen tests run under jest-expo/web with @testing-library/react.
export {};
