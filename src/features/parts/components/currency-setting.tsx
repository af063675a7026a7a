import { useId } from 'react';
import { inputClass } from '../../../components/field';
import { useCurrency } from '../hooks/use-currency';
import { currencies, isCurrency } from '../lib/money';

/** Which currency costs are shown and typed in; kept in this browser. */
export function CurrencySetting() {
  const id = useId();
  const [currency, setCurrency] = useCurrency();
  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="whitespace-nowrap text-sm font-semibold">
        Costs in
      </label>
      <select id={id} value={currency} onChange={(e) => isCurrency(e.target.value) && setCurrency(e.target.value)} className={`${inputClass} w-auto`}>
        {currencies.map((c) => (
          <option key={c} value={c}>
            {c}
          </option>
        ))}
      </select>
    </div>
  );
}
