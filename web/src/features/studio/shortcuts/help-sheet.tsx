import { StudioDialog } from '../ui/studio-dialog';
import { SHORTCUT_HELP } from './shortcuts';

/** Every keyboard shortcut of the studio, from the same table the key handler reads. */
export function HelpSheet({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <StudioDialog open={open} title="Keyboard shortcuts" onClose={onClose} wide>
      <p className="mb-3 text-ink-muted">
        Shortcuts work when the cursor is not in a text field. The video player has its own keys when it has focus.
      </p>
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Studio keyboard shortcuts</caption>
        <thead>
          <tr>
            <th scope="col" className="border-b border-line py-1 pr-4 text-sm">
              Keys
            </th>
            <th scope="col" className="border-b border-line py-1 text-sm">
              What it does
            </th>
          </tr>
        </thead>
        <tbody>
          {SHORTCUT_HELP.map((row) => (
            <tr key={row.does} className="border-b border-line last:border-b-0">
              <td className="py-1.5 pr-4 whitespace-nowrap">
                {row.keys.map((key, index) => (
                  <span key={`${key}-${index}`}>
                    {index > 0 ? (
                      <span className="px-1 text-ink-muted">{row.keys.length === 2 && row.keys[0] === 'P' ? 'then' : '+'}</span>
                    ) : null}
                    <kbd className="rounded border border-line-strong bg-sunken px-1.5 py-0.5 font-mono text-sm">{key}</kbd>
                  </span>
                ))}
              </td>
              <td className="py-1.5">{row.does}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </StudioDialog>
  );
}
