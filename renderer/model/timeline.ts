/**
 * Undo and redo over a job's stored revisions, so they survive a restart. Undo restores an earlier
 * revision, which the store records as a new revision "restored revision N"; replaying the reasons in
 * order rebuilds where in the history the job stands now.
 */
export interface RevisionStep {
  revision: number;
  reason: string;
}

export interface Timeline {
  /** Revisions in undo order: each one a state the estimator saved or restored from the history. */
  states: number[];
  /** Index in `states` of the state the job is in now. */
  position: number;
}

const restored = /^restored revision (\d+)$/;

export function timelineOf(steps: readonly RevisionStep[]): Timeline {
  const states: number[] = [];
  let position = -1;
  for (const step of [...steps].sort((a, b) => a.revision - b.revision)) {
    const m = restored.exec(step.reason);
    const target = m ? states.indexOf(Number(m[1])) : -1;
    if (target >= 0) {
      // An undo or a redo: the job is back in a state already on the timeline.
      position = target;
      continue;
    }
    // A new state (an edit, or a restore of a revision off the timeline) drops everything after the position.
    states.splice(position + 1);
    states.push(step.revision);
    position = states.length - 1;
  }
  return { states, position };
}

export const undoTarget = (t: Timeline): number | null => (t.position > 0 ? t.states[t.position - 1]! : null);
export const redoTarget = (t: Timeline): number | null => (t.position >= 0 && t.position < t.states.length - 1 ? t.states[t.position + 1]! : null);
