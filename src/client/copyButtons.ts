/**
 * Copy buttons: every `button[data-copy]` copies the text of the element whose id it names to the clipboard and
 * says so for two seconds. Evaluation-free; the text was written at build time.
 */
export function mountCopyButtons(root: ParentNode = document): void {
  for (const button of root.querySelectorAll<HTMLButtonElement>('button[data-copy]')) {
    button.hidden = false;
    button.addEventListener('click', () => {
      const source = document.getElementById(button.dataset['copy'] ?? '');
      if (source === null) return;
      const label = button.textContent;
      navigator.clipboard.writeText(source.textContent ?? '').then(
        () => (button.textContent = 'Copied'),
        () => (button.textContent = 'Copy failed: select the text instead'),
      );
      setTimeout(() => (button.textContent = label), 2000);
    });
  }
}
