import type { Project } from '@mainbrace/solver';

/** Offers a file (text, or the bytes of a drawing) to the user as a download. */
export function download(name: string, data: BlobPart, type: string) {
  const url = URL.createObjectURL(new Blob([data], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** A file name from the project name: letters, digits and dashes. */
export const fileStem = (p: Project) =>
  p.name
    .replace(/[^\p{L}\p{N}]+/gu, '-')
    .replace(/^-|-$/g, '')
    .toLowerCase() || 'mainbrace-project';

/** The project file as saved: the document itself, two-space JSON. */
export const projectText = (p: Project) => JSON.stringify(p, null, 2) + '\n';
