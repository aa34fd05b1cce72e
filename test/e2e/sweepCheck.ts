/**
 * What the sweep checks on a page as it stands, run inside the page (no imports: the function is
 * serialised by playwright). Each problem names the element (its tag, class and text) and why.
 */

export interface SweepReport {
  elements: number;
  problems: string[];
}

export interface SweepOptions {
  language: 'en' | 'es' | 'de';
  /** The phone's width in CSS px. Not `innerWidth`: a mobile browser widens its layout viewport to content that overflows. */
  width: number;
}

/** Runs in the browser: text that overflows or is clipped, the wrong decimal mark, long floats, raw keys. */
export function sweepPage({ language, width }: SweepOptions): SweepReport {
  const problems: string[] = [];
  const canvas = document.createElement('canvas').getContext('2d')!;
  const describe = (el: Element, text: string) =>
    `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ''}${
      typeof el.className === 'string' && el.className ? `.${el.className.trim().split(/\s+/u).join('.')}` : ''
    } "${text.trim().replace(/\s+/gu, ' ').slice(0, 80)}"`;
  const visible = (el: Element) => {
    if (el.closest('[hidden], [aria-hidden="true"] *') && !el.closest('.bottom-nav')) return false;
    // Text for screen readers only is clipped to 1 px on purpose; its words are still checked below.
    if (el.closest('.visually-hidden')) return false;
    // The classic visually-hidden pattern (`clip: rect(0 0 0 0)` in 1 px), as the narrow header hides its name.
    if (el.clientWidth <= 1 && el.clientHeight <= 1 && getComputedStyle(el).position === 'absolute') return false;
    const style = getComputedStyle(el);
    return style.visibility !== 'hidden' && style.display !== 'none' && el.getClientRects().length > 0;
  };
  /** Elements whose text is the person's own (part numbers, notes) or shows notation on purpose. */
  const literal = (el: Element) => el.closest('[data-literal]') !== null;
  const ownText = (el: Element) =>
    [...el.childNodes]
      .filter((n) => n.nodeType === Node.TEXT_NODE)
      .map((n) => n.textContent ?? '')
      .join('');
  const textWidth = (el: Element, text: string) => {
    const style = getComputedStyle(el);
    canvas.font = `${style.fontStyle} ${style.fontWeight} ${style.fontSize} ${style.fontFamily}`;
    return canvas.measureText(text).width;
  };
  const innerWidth = (el: HTMLElement) => {
    const style = getComputedStyle(el);
    return el.clientWidth - parseFloat(style.paddingLeft) - parseFloat(style.paddingRight);
  };

  // Figures and words: everything a person can read, then what fields show.
  const texts: { el: Element; text: string }[] = [];
  let elements = 0;
  for (const el of document.body.querySelectorAll('*')) {
    if (el instanceof SVGElement || el.tagName === 'SCRIPT' || el.tagName === 'STYLE' || !visible(el)) continue;
    elements++;
    const own = ownText(el);
    if (own.trim() !== '') {
      texts.push({ el, text: own });
      // Text past the screen's edge, whatever clips or scrolls around it.
      for (const node of el.childNodes) {
        if (node.nodeType !== Node.TEXT_NODE || !node.textContent?.trim()) continue;
        const range = document.createRange();
        range.selectNodeContents(node);
        const box = range.getBoundingClientRect();
        if (box.width > 0 && (box.right > width + 1 || box.left < -1))
          problems.push(
            `text past the screen edge ${describe(el, own)}: ${Math.round(box.left)}–${Math.round(box.right)} px`,
          );
      }
    }
    for (const attribute of ['aria-label', 'title', 'placeholder']) {
      const value = el.getAttribute(attribute);
      if (value) texts.push({ el, text: value });
    }
    if (el instanceof HTMLInputElement && el.type === 'text' && el.inputMode && el.value) {
      texts.push({ el, text: el.value });
    }
    if (el instanceof HTMLSelectElement) {
      const option = el.selectedOptions[0];
      if (option) texts.push({ el, text: option.text });
    }
    // Overflow and clipping, for anything that holds text.
    if (!(el instanceof HTMLElement)) continue;
    if (el instanceof HTMLInputElement && (el.type === 'text' || el.type === 'search' || el.type === 'date')) {
      const shown = el.value || el.placeholder;
      if (shown && textWidth(el, shown) > innerWidth(el) + 1)
        problems.push(
          `clipped field ${describe(el, shown)}: ${Math.round(textWidth(el, shown))} px text in ${Math.round(innerWidth(el))} px`,
        );
      continue;
    }
    if (el instanceof HTMLTextAreaElement) {
      if (el.scrollHeight > el.clientHeight + 1)
        problems.push(`text hidden in ${describe(el, el.value)}: ${el.scrollHeight} px high in ${el.clientHeight} px`);
      continue;
    }
    if (el instanceof HTMLSelectElement) {
      const shown = el.selectedOptions[0]?.text ?? '';
      // A menu drawn by the label stacked under it (ChoiceField `wrap`): that label is checked as text.
      const drawnByLabel = getComputedStyle(el).opacity === '0' && el.parentElement?.querySelector('.choice-shown');
      if (shown && !drawnByLabel && textWidth(el, shown) > innerWidth(el) + 1)
        problems.push(
          `clipped menu ${describe(el, shown)}: ${Math.round(textWidth(el, shown))} px text in ${Math.round(innerWidth(el))} px`,
        );
      continue;
    }
    const overflowX = getComputedStyle(el).overflowX;
    if (own.trim() === '' && el.children.length > 0) {
      // A box that scrolls or clips sideways hides part of what it holds on a phone (a table's last columns).
      if (overflowX !== 'visible' && el.clientWidth > 0 && el.scrollWidth > el.clientWidth + 1)
        problems.push(
          `content cut off sideways in ${describe(el, el.textContent)}: ${el.scrollWidth} px in ${el.clientWidth} px`,
        );
      continue;
    }
    if (el.clientWidth === 0 || getComputedStyle(el).display === 'inline') continue;
    if (el.scrollWidth > el.clientWidth + 1) {
      problems.push(`text overflows ${describe(el, el.textContent)}: ${el.scrollWidth} px in ${el.clientWidth} px`);
    }
    const overflowY = getComputedStyle(el).overflowY;
    if ((overflowY === 'hidden' || overflowY === 'clip') && el.scrollHeight > el.clientHeight + 1) {
      problems.push(
        `text clipped ${describe(el, el.textContent)}: ${el.scrollHeight} px high in ${el.clientHeight} px`,
      );
    }
  }

  const wrongMark =
    language === 'en'
      ? // A comma between digits that is not thousands grouping (10,000).
        /(?<![\d.,])(?!\d{1,3}(?:,\d{3})+(?![\d.,]))\d+,\d+/u
      : // A point between digits that is not thousands grouping (10.000), a date, a time or a version.
        /(?<![\d.,:-])(?!\d{1,3}(?:\.\d{3})+(?![\d.,]))\d+\.\d+(?![\d.:-])/u;
  const rawKey = /\b(?:app|errors|warnings|jobs|cli)\.[a-z][A-Za-z]+\.[A-Za-z.]+\b/u;
  for (const { el, text } of texts) {
    if (/\{\{|\}\}|\bundefined\b|\bNaN\b|Infinity|\[object |\bnull\b/u.test(text))
      problems.push(`placeholder or non-value ${describe(el, text)}`);
    if (rawKey.test(text)) problems.push(`raw key ${describe(el, text)}`);
    if (literal(el)) continue;
    const mark = wrongMark.exec(text);
    if (mark)
      problems.push(`${language === 'en' ? 'comma' : 'point'} as decimal mark "${mark[0]}" in ${describe(el, text)}`);
    // Dates and clock times are not figures ("02.12.2026, 14:35").
    const withoutDates = text.replace(/\d{1,4}[./-]\d{1,2}[./-]\d{1,4}|\d{1,2}:\d{2}/gu, ' ');
    for (const figure of withoutDates.match(/\d[\d.,]*\d/gu) ?? []) {
      const digits = figure.replace(/[^\d]/gu, '').replace(/^0+/u, '');
      const hasFraction = /[.,]\d/u.test(figure);
      if (hasFraction && digits.length > 6)
        problems.push(`figure of ${digits.length} digits "${figure}" in ${describe(el, text)}`);
    }
  }

  const pageOverflow = Math.max(document.documentElement.scrollWidth, window.innerWidth) - width;
  if (pageOverflow > 0) problems.push(`page ${pageOverflow} px wider than the screen`);
  return { elements, problems };
}
