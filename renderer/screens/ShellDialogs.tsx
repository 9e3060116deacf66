import { Dialog } from '../components/Dialog';
import { shortcuts } from '../hooks/commands';

export function ShortcutsDialog({ open, onClose }: { open: boolean; onClose(): void }) {
  return (
    <Dialog title="Keyboard" open={open} onClose={onClose}>
      <p>Every action is on the keyboard: Tab and Shift+Tab move between controls, Enter or Space presses a button,
        arrow keys move between tabs. These keys work from anywhere:</p>
      <table className="table table--compact">
        <thead><tr><th scope="col">Keys</th><th scope="col">Does</th></tr></thead>
        <tbody>
          {shortcuts.map((s) => <tr key={s.command}><td><kbd>{s.keys}</kbd></td><td>{s.what}</td></tr>)}
        </tbody>
      </table>
    </Dialog>
  );
}

/** Shown when a screen cannot be left without losing changes that are not saved. */
export function LeaveDialog({ open, onStay, onDiscard }: { open: boolean; onStay(): void; onDiscard(): void }) {
  return (
    <Dialog
      title="Changes not saved" open={open} onClose={onStay}
      actions={<>
        <button type="button" className="button button--primary" onClick={onStay} autoFocus>Keep editing</button>
        <button type="button" className="button button--danger" onClick={onDiscard}>Discard the changes and leave</button>
      </>}
    >
      <p>This screen has changes that are not saved: on a job, fields to complete or correct, or a save the store
        refused (the line under the job’s title says which); in the settings, the changes wait for “Save settings”.
        Keep editing to finish them, or leave and lose those changes.</p>
    </Dialog>
  );
}
