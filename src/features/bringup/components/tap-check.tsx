import { useId, useState } from 'react';
import { inputClass } from '../../../components/field';
import { tapWords } from '../lib/inline-limits';

const toNumber = (text: string) => (text.trim() === '' ? null : Number(text.replace(',', '.')));

/** The bench library's tap arithmetic, beside "mains tap matched": what a winding gives on this tap at this mains. */
export function TapCheck() {
  const id = useId();
  const [rated, setRated] = useState('6.3');
  const [tap, setTap] = useState('');
  const [mains, setMains] = useState('');
  const words = tapWords({ ratedVolts: toNumber(rated), tapVolts: toNumber(tap), mainsVolts: toNumber(mains) });
  const box = (label: string, value: string, set: (v: string) => void, key: string) => (
    <div>
      <label htmlFor={`${id}-${key}`} className="text-sm font-semibold">
        {label}
      </label>
      <input
        id={`${id}-${key}`}
        inputMode="decimal"
        value={value}
        onChange={(e) => set(e.target.value)}
        className={`${inputClass} font-mono`}
      />
    </div>
  );
  return (
    <div className="rounded-lg bg-sunken p-3">
      <p className="text-sm font-semibold">What a winding gives on this tap</p>
      <div className="grid gap-2 sm:grid-cols-3">
        {box('Winding rating (V)', rated, setRated, 'rated')}
        {box('Tap set (V)', tap, setTap, 'tap')}
        {box('Local mains (V)', mains, setMains, 'mains')}
      </div>
      <p aria-live="polite" className="mt-2 text-sm">
        {words ??
          'Enter the tap and the local mains to see what the winding gives (ideal transformer; real sets read a little lower under load).'}
      </p>
    </div>
  );
}
