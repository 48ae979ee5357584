import { AlertIcon } from '@/components/ui/icons';
import { RichText } from '@/components/rich-text/rich-text';

/** The server could not read the answer; no attempt was used. */
export function ProblemMessage({ id, problem }: { id: string; problem: string | null }) {
  if (!problem) return null;
  return (
    <div id={id} role="alert" className="flex items-start gap-2 rounded-md border-l-4 border-danger bg-danger-soft px-3 py-2">
      <AlertIcon className="mt-1 size-5 shrink-0 text-danger" />
      <div className="min-w-0">
        <p className="font-bold">This answer could not be read (no attempt used)</p>
        <RichText markdown={problem} />
      </div>
    </div>
  );
}
