import { RichText } from '@/components/rich-text/rich-text';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import type { RefusedAnswer } from '../use-watch-answers';

/** Answers kept on this device that the server later turned away or could not read: said once each, with the server's words. */
export function RefusedAnswers({
  items,
  nameOf,
  onDismiss,
}: {
  items: readonly RefusedAnswer[];
  nameOf: (checkpointKey: string) => string;
  onDismiss: (id: string) => void;
}) {
  if (items.length === 0) return null;
  return (
    <div className="flex flex-col gap-2">
      {items.map((item) => (
        <Banner key={item.id} tone="error" title={`An answer was not recorded: ${nameOf(item.checkpointKey)}`}>
          <RichText markdown={item.message} />
          <p className="mt-1 text-sm">Open that checkpoint from the list to answer it again where attempts remain.</p>
          <Button size="sm" variant="secondary" className="mt-2" onClick={() => onDismiss(item.id)}>
            Dismiss
          </Button>
        </Banner>
      ))}
    </div>
  );
}
