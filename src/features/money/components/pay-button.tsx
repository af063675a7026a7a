import type { Invoice } from '../../../../shared/schemas/invoices';
import { Button } from '../../../components/button';
import { useCheckout } from '../api/payments';
import { moneyText } from './money-text';

/** Pays what is left on a deposit request or invoice by card, on the payment service's own checkout page. */
export function PayButton({ invoice }: { invoice: Invoice }) {
  const checkout = useCheckout();
  const left = invoice.left;
  return (
    <div className="space-y-2">
      <Button onClick={() => checkout.mutate(invoice.id)} disabled={checkout.isPending || checkout.isSuccess}>
        {checkout.isPending || checkout.isSuccess ? 'Opening the payment page…' : `Pay ${moneyText(left)} by card`}
      </Button>
      {checkout.error && (
        <p role="alert" className="font-semibold text-danger">
          {checkout.error.message}
        </p>
      )}
    </div>
  );
}
