import { Link } from 'react-router-dom';
import { LogoMark } from '@/components/ui/icons';

/** The product name with its mark, linking to `to` (the landing page or the role's home). */
export function Brand({ to }: { to: string }) {
  return (
    <Link to={to} className="inline-flex items-center gap-2 rounded-md text-xl font-bold text-ink no-underline">
      <LogoMark className="size-8" />
      Pinfield
    </Link>
  );
}
