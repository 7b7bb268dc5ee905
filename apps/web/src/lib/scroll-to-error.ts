/** After a refused submit of a long form (on a phone especially): bring the first marked field into view and focus it. */
export function scrollToFirstError(formName: string): void {
  window.requestAnimationFrame(() => {
    const field = document.querySelector<HTMLElement>(
      `form[aria-label="${formName.replace(/"/g, '\\"')}"] [aria-invalid="true"]`,
    );
    field?.scrollIntoView({ block: 'center', behavior: 'smooth' });
    field?.focus({ preventScroll: true });
  });
}
