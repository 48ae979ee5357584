import { Button } from '@/components/ui/button';

export function SubmitRow({ label, busy, locked }: { label: string; busy: boolean; locked: boolean }) {
  if (locked) return null;
  return (
    <div>
      <Button type="submit" busy={busy} className="w-full sm:w-auto">
        {label}
      </Button>
    </div>
  );
}
