// Shared test setup. Component tests opt into jsdom with a `// @vitest-environment jsdom` docblock;
// the layout stubs React Flow needs there live in tests/unit/ui/flowStubs.ts.
export {};
