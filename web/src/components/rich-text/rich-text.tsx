import { useMemo } from 'react';
import { cn } from '@/lib/cn';
import { renderMarkdown } from './render-markdown';
import './rich-text.css';

/** A teacher's Markdown shown safely (see renderMarkdown): the one place teacher text becomes HTML. */
export function RichText({ markdown, className }: { markdown: string; className?: string }) {
  const html = useMemo(() => renderMarkdown(markdown), [markdown]);
  // Safe: renderMarkdown escapes raw HTML, allows only http(s) links and our own image paths, and KaTeX runs with trust off.
  return <div className={cn('rich-text break-words', className)} dangerouslySetInnerHTML={{ __html: html }} />;
}
