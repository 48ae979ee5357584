import { cn } from '@/lib/cn';

/** A lesson's topic tags as small labels. */
export function TagList({ tags, className }: { tags: string[]; className?: string }) {
  if (tags.length === 0) return null;
  return (
    <ul aria-label="Topic tags" className={cn('flex flex-wrap gap-1.5', className)}>
      {tags.map((tag) => (
        <li key={tag} className="rounded-md border border-line bg-sunken px-2 py-0.5 text-sm">
          {tag}
        </li>
      ))}
    </ul>
  );
}
