import { useEffect, useState } from 'react';
import { onFileProblem, type FileProblem } from '../files/fileActions.ts';

/** Lists every message from a file that failed validation; the open project was not touched. */
export function FileProblemDialog() {
  const [problem, setProblem] = useState<FileProblem | null>(null);
  useEffect(() => {
    onFileProblem(setProblem);
    return () => onFileProblem(null);
  }, []);
  if (!problem) return null;
  return (
    <div className="ed-modal-backdrop">
      <div
        className="ed-modal"
        role="alertdialog"
        aria-labelledby="file-problem-title"
        data-testid="file-problem"
      >
        <h2 id="file-problem-title">{problem.fileName} was not opened</h2>
        <p>The file did not pass the checks below. Your open project has not been changed.</p>
        <ul className="ed-problem-list">
          {problem.errors.map((e, i) => (
            <li key={i}>{e}</li>
          ))}
        </ul>
        <div className="ed-modal-foot">
          <button type="button" className="ed-btn is-primary" onClick={() => setProblem(null)} autoFocus>
            Close
          </button>
        </div>
      </div>
    </div>
  );
}
