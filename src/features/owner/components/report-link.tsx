import { buttonClass } from '../../../components/button';
import { reportUrl } from '../lib/owner-words';

/** A plain link to the PDF: the browser downloads it with the session cookie, no script needed. */
export function ReportLink({ restorationId }: { restorationId: number }) {
  return (
    <a href={reportUrl(restorationId)} download className={buttonClass('primary', 'w-full sm:w-auto')}>
      <svg
        viewBox="0 0 20 20"
        aria-hidden="true"
        className="h-5 w-5"
        fill="none"
        stroke="currentColor"
        strokeWidth={1.8}
        strokeLinecap="round"
        strokeLinejoin="round"
      >
        <path d="M10 3v9m-4-4 4 4 4-4M4 15.5h12" />
      </svg>
      Download the hand-back report (PDF)
    </a>
  );
}
