import hljs from 'highlight.js/lib/core';
import cpp from 'highlight.js/lib/languages/cpp';
import json from 'highlight.js/lib/languages/json';
import markdown from 'highlight.js/lib/languages/markdown';
import type { FirmwareFileLanguage } from '@shared/schemas/firmware';

// Only the three languages a bundle holds, so the section's chunk stays small.
hljs.registerLanguage('cpp', cpp);
hljs.registerLanguage('json', json);
hljs.registerLanguage('markdown', markdown);

function escapeHtml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

/**
 * The file as HTML with token spans. highlight.js escapes the text it is given, so the result
 * holds no markup from the file itself; plain text is escaped here.
 */
export function highlightHtml(content: string, language: FirmwareFileLanguage): string {
  if (language === 'text') return escapeHtml(content);
  return hljs.highlight(content, { language, ignoreIllegals: true }).value;
}

/** Lines in the file, counting a last line without a newline. */
export function lineCount(content: string): number {
  if (content === '') return 1;
  const lines = content.split('\n').length;
  return content.endsWith('\n') ? lines - 1 : lines;
}
