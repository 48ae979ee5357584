import { InfoIcon } from '@/components/ui/icons';

/** An answer kept on this device: it counts (a gate lets the video go on), its grade comes once it reaches the server. */
export function PendingPanel() {
  return (
    <section
      aria-label="Result"
      className="flex flex-col gap-2 rounded-md border-l-4 border-teal bg-teal-soft px-4 py-3"
      data-verdict="pending"
    >
      <p className="flex items-center gap-2 text-lg font-bold" role="status">
        <InfoIcon className="size-6 shrink-0 text-teal" />
        Saved on this device, not graded yet
      </p>
      <p>
        It is sent as soon as the connection allows, even after a reload. Feedback, hints and another try appear here once it has been
        graded. You can go on watching.
      </p>
    </section>
  );
}
