import { TextAreaField } from '../../components/form/inputs';
import { useSettingsDraft } from './draft';
import { SCheck, SText } from './fields';

/** What every quote states besides prices, unless the customer or the quote itself says otherwise. */
export function QuoteTermsSection() {
  const d = useSettingsDraft();
  const certificates = (d.get('quoteTerms.certificates') as string[] | undefined) ?? [];
  return (
    <section className="settings-section" id="settings-quote-terms" aria-labelledby="settings-quote-terms-title">
      <h2 id="settings-quote-terms-title">Quote terms</h2>
      <p className="muted">Printed on every quote. A customer’s own payment terms replace the shop’s; each quote may change any of them.</p>
      <div className="grid grid--3">
        <SText path="quoteTerms.paymentTerms" label="Payment terms" wide />
        <SText path="quoteTerms.deliveryTerms" label="Delivery terms" wide />
        <SText path="quoteTerms.packaging" label="Packaging" wide />
        <SText path="quoteTerms.estimator" label="Estimator who signs quotes" />
        <SCheck path="quoteTerms.priceCurveOnQuote" label="Print price against quantity on quotes" hint="Always shown on the Cost tab" />
      </div>
      <TextAreaField path="quoteTerms.certificates" label="Certificates offered (one a line, up to 6)" rows={2} value={certificates.join('\n')}
        onChange={(t) => d.set('quoteTerms.certificates', t.split('\n'))} />
    </section>
  );
}
