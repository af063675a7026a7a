import { shortcutHelp } from '../model/shortcuts';
import { FloatingPanel } from './floating-panel';

/** Pointer and touch gestures, listed after the keys. */
const gestures: readonly { keys: readonly string[]; description: string }[] = [
  { keys: ['Drag'], description: 'With Select, on empty photo: move around the photo' },
  { keys: ['Space+drag', 'Middle button'], description: 'Move around the photo with any tool' },
  { keys: ['Wheel', 'Pinch'], description: 'Zoom around the pointer, or between two fingers' },
  { keys: ['?'], description: 'Show or hide this list' },
];

/** The keyboard shortcuts (from the key map's own help list) and gestures; "?" opens and closes it. */
export function ShortcutHelp({ onClose }: { onClose: () => void }) {
  return (
    <FloatingPanel title="Keys and gestures" closeKeys={['?']} onClose={onClose}>
      <dl className="space-y-1.5 text-sm">
        {[...shortcutHelp, ...gestures].map(({ keys, description }) => (
          <div key={description} className="flex gap-3">
            <dt className="flex w-32 shrink-0 flex-wrap items-start gap-1">
              {keys.map((k, i) => (
                <span key={k} className="inline-flex items-center gap-1">
                  {i > 0 && <span className="text-ink-soft">or</span>}
                  <kbd className="rounded border border-rule bg-sunken px-1.5 font-mono text-xs">{k}</kbd>
                </span>
              ))}
            </dt>
            <dd className="min-w-0">{description}</dd>
          </div>
        ))}
      </dl>
    </FloatingPanel>
  );
}
