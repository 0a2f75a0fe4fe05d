import { CAUTIONS } from '../model/cautions.ts';

export function App() {
  return (
    <main data-testid="app">
      <h1>Dropline</h1>
      <ul>
        {CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </main>
  );
}
