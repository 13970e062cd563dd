'use client';

/** Opens the browser's print dialogue for the sheet (the print stylesheet does the layout). */
export function PrintButton() {
  return (
    <button
      type="button"
      onClick={() => window.print()}
      className="rounded-md bg-leaf-700 px-3 py-1.5 text-sm font-medium text-white hover:bg-leaf-900"
    >
      Print
    </button>
  );
}
