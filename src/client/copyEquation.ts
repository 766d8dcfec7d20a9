/**
 * Copy-clean equations. Each `.equation-copy` block carries the plain-text forms of the equation beside the KaTeX
 * rendering; its buttons copy one form to the clipboard. Selecting the typeset equation (or a passage that holds
 * it) and copying yields the plain text too, instead of KaTeX's doubled MathML and HTML text with math-italic
 * letters and U+2212 minus signs: the copy handler puts the equation's printed-digit plain text in place of each
 * equation, and the TeX of inline symbols without their backslashes and braces.
 *
 * @example <div class="equation" data-plain="cp = 1.2 + 3.4e-3*T">…KaTeX…</div>
 *   <button data-copy-text="cp = 1.2 + 3.4e-3*T">Copy</button>  → clipboard: "cp = 1.2 + 3.4e-3*T"
 */

/** Write text to the clipboard: the asynchronous Clipboard API, or a hidden text area and execCommand. */
async function writeClipboard(text: string): Promise<void> {
  if (navigator.clipboard?.writeText) {
    try {
      await navigator.clipboard.writeText(text);
      return;
    } catch {
      // Permission refused or an insecure context: fall back below.
    }
  }
  const area = document.createElement('textarea');
  area.value = text;
  area.setAttribute('readonly', '');
  area.style.position = 'fixed';
  area.style.opacity = '0';
  document.body.append(area);
  area.select();
  const copied = document.execCommand('copy');
  area.remove();
  if (!copied) throw new Error('copy refused');
}

/** TeX of an inline symbol as plain text: commands lose their backslash, groups their braces. */
function plainTex(tex: string): string {
  return tex.replace(/\\[,;:! ]/g, ' ').replace(/\\([A-Za-z]+)/g, '$1').replace(/[{}]/g, '').replace(/\s+/g, ' ').trim();
}

/** The plain text of one KaTeX element: its equation's data-plain, or its own TeX made plain. */
function plainOf(katexElement: Element): string {
  const equation = katexElement.closest('[data-plain]');
  if (equation !== null) return equation.getAttribute('data-plain') ?? '';
  const tex = katexElement.querySelector('annotation[encoding="application/x-tex"]')?.textContent ?? '';
  return plainTex(tex);
}

/** Replace every KaTeX rendering inside a copied fragment by its plain text. */
function plainFragmentText(fragment: DocumentFragment): string {
  const container = document.createElement('div');
  container.append(fragment);
  // A copied piece of an equation holds parts of its KaTeX: take the whole equation once.
  for (const equation of Array.from(container.querySelectorAll('[data-plain]'))) equation.replaceWith(document.createTextNode(equation.getAttribute('data-plain') ?? ''));
  for (const element of Array.from(container.querySelectorAll('.katex'))) element.replaceWith(document.createTextNode(plainOf(element)));
  for (const hidden of Array.from(container.querySelectorAll('.katex-mathml, .katex-html'))) hidden.remove();
  return (container.textContent ?? '').replace(/[ \t]+\n/g, '\n').replace(/\s+$/, '');
}

function onCopy(event: ClipboardEvent): void {
  const selection = document.getSelection();
  if (selection === null || selection.isCollapsed || event.clipboardData === null) return;
  const texts: string[] = [];
  let touchesMath = false;
  for (let index = 0; index < selection.rangeCount; index += 1) {
    const range = selection.getRangeAt(index);
    const start = range.startContainer instanceof Element ? range.startContainer : range.startContainer.parentElement;
    const end = range.endContainer instanceof Element ? range.endContainer : range.endContainer.parentElement;
    const inside = start?.closest('[data-plain]') ?? null;
    if (inside !== null && inside === end?.closest('[data-plain]')) {
      // The selection lies inside one equation: copy that equation whole.
      texts.push(inside.getAttribute('data-plain') ?? '');
      touchesMath = true;
      continue;
    }
    const fragment = range.cloneContents();
    if (fragment.querySelector('.katex, .katex-html, .katex-mathml') !== null || start?.closest('.katex') || end?.closest('.katex')) touchesMath = true;
    texts.push(plainFragmentText(fragment));
  }
  if (!touchesMath) return;
  event.clipboardData.setData('text/plain', texts.join('\n'));
  event.preventDefault();
}

let copyHandlerAdded = false;

/** Wire every copy button and the page's copy handler once. */
export function mountEquationCopy(root: ParentNode = document): void {
  for (const button of Array.from(root.querySelectorAll<HTMLButtonElement>('button[data-copy-text]'))) {
    if (button.dataset['copyWired'] === '1') continue;
    button.dataset['copyWired'] = '1';
    button.hidden = false;
    const status = button.parentElement?.querySelector<HTMLElement>('.copy-status') ?? null;
    button.addEventListener('click', () => {
      const text = button.dataset['copyText'] ?? '';
      writeClipboard(text).then(
        () => {
          if (status) status.textContent = 'Copied';
        },
        () => {
          if (status) status.textContent = 'Copy failed: select the text and copy it';
        },
      );
    });
  }
  if (!copyHandlerAdded) document.addEventListener('copy', onCopy);
  copyHandlerAdded = true;
}
