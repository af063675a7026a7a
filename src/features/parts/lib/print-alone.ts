/**
 * Classes for an element that should print on its own. When printing, and only while the element is on the page,
 * everything else is hidden — the app's header, tabs and footer included, which belong to the shell this feature
 * cannot touch — and the elements that contain it lose their spacing and width limits, so the sheet starts at
 * the top of the paper. Text prints black on white whichever theme is on screen.
 */
export const printAlone = [
  'print:[body:has(&)_:not(:has(&),&,&_*)]:hidden',
  'print:[body:has(&)_:has(&)]:m-0',
  'print:[body:has(&)_:has(&)]:p-0',
  'print:[body:has(&)_:has(&)]:max-w-none',
  'print:[body:has(&)_:has(&)]:min-h-0',
  'print:[body:has(&)_:has(&)]:border-0',
  'print:[body:has(&)]:min-h-0',
  'print:[html:has(&)]:bg-white',
  'print:m-0',
  'print:bg-white',
  'print:text-black',
  'print:**:text-black',
  'print:**:bg-transparent',
].join(' ');
