// Prepares a received e-mail's HTML for a sandboxed iframe (srcDoc). The iframe's sandbox already
// forbids scripts and same-origin access; this also strips active content and event handlers, and
// a Content-Security-Policy stops the message from loading anything from the network (no remote
// images, fonts or styles), so opening a message tells no one it was read.

const REMOVED_ELEMENTS = [
  'script',
  'noscript',
  'iframe',
  'frame',
  'frameset',
  'object',
  'embed',
  'applet',
  'form',
  'input',
  'button',
  'select',
  'textarea',
  'link',
  'meta',
  'base',
  'template',
  'portal',
].join(',');

const URL_ATTRIBUTES = new Set([
  'href',
  'src',
  'action',
  'formaction',
  'background',
  'poster',
  'xlink:href',
  'srcset',
  'ping',
]);

const CONTENT_SECURITY_POLICY =
  "default-src 'none'; style-src 'unsafe-inline'; img-src data: cid:; font-src data:; form-action 'none'";

const BASE_STYLE =
  'body{margin:16px;font-family:Manrope,ui-sans-serif,system-ui,sans-serif;font-size:14px;line-height:1.5;color:#1e2728;word-wrap:break-word}img{max-width:100%;height:auto}';

function isSafeUrl(value: string): boolean {
  // Browsers ignore whitespace and control characters inside a scheme ("java\tscript:").
  const compact = Array.from(value)
    .filter((character) => {
      const code = character.charCodeAt(0);
      return code > 0x20 && code !== 0x7f;
    })
    .join('')
    .toLowerCase();
  if (compact === '' || compact.startsWith('#')) {
    return true;
  }
  const scheme = /^([a-z][a-z0-9+.-]*):/.exec(compact)?.[1];
  if (scheme === undefined) {
    return true; // relative: resolves against about:srcdoc, harmless
  }
  if (scheme === 'data') {
    return /^data:image\/(png|gif|jpe?g|webp);/.test(compact);
  }
  return ['http', 'https', 'mailto', 'tel', 'cid'].includes(scheme);
}

export function sanitiseMailHtml(html: string): string {
  const doc = new DOMParser().parseFromString(html, 'text/html');
  doc.querySelectorAll(REMOVED_ELEMENTS).forEach((element) => element.remove());

  doc.querySelectorAll('*').forEach((element) => {
    for (const attribute of Array.from(element.attributes)) {
      const name = attribute.name.toLowerCase();
      if (name.startsWith('on') || name === 'srcdoc' || name === 'formaction') {
        element.removeAttribute(attribute.name);
      } else if (URL_ATTRIBUTES.has(name) && !isSafeUrl(attribute.value)) {
        element.removeAttribute(attribute.name);
      }
    }
    if (element.tagName === 'A') {
      element.setAttribute('target', '_blank');
      element.setAttribute('rel', 'noopener noreferrer');
    }
  });

  const styles = Array.from(doc.querySelectorAll('style'))
    .map((style) => style.outerHTML)
    .join('');
  doc.querySelectorAll('style').forEach((style) => style.remove());

  return [
    '<!doctype html><html><head><meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="${CONTENT_SECURITY_POLICY}">`,
    `<style>${BASE_STYLE}</style>`,
    styles,
    '</head><body>',
    doc.body.innerHTML,
    '</body></html>',
  ].join('');
}
