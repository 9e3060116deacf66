import { useId, useState } from 'react';
import { usePlatform } from '../../api';
import { TextAreaField } from '../../components/form/inputs';
import { useSettingsDraft } from './draft';
import { SNumber, SSelect, SText } from './fields';

export function ProfileSection() {
  const d = useSettingsDraft();
  const platform = usePlatform();
  const fileId = useId();
  const [logoNote, setLogoNote] = useState<string | null>(null);
  const lines = (d.get('shopProfile.addressLines') as string[] | undefined) ?? [];
  const logo = d.get('shopProfile.logo');
  const pickLogo = async (file: File | undefined) => {
    if (!file) return;
    const url = await platform.readDataUrl(file);
    d.set('shopProfile.logo', url);
    setLogoNote(`${file.name}, ${Math.ceil(file.size / 1024)} kB`);
  };
  return (
    <section className="settings-section" id="settings-profile" aria-labelledby="settings-profile-title">
      <h2 id="settings-profile-title">Shop profile</h2>
      <p className="muted">Printed at the head of every quote and traveller.</p>
      <div className="grid grid--3">
        <SText path="shopProfile.name" label="Shop name" wide />
        <SText path="shopProfile.phone" label="Phone" type="tel" />
        <SText path="shopProfile.email" label="E-mail" type="email" />
      </div>
      <TextAreaField path="shopProfile.addressLines" label="Address (one line each, up to 6)" rows={3} value={lines.join('\n')}
        onChange={(t) => d.set('shopProfile.addressLines', t.split('\n'))} />
      <div className="logo-pick">
        <label htmlFor={fileId} className="field__label">Logo (PNG, JPEG or SVG)</label>
        <input id={fileId} type="file" accept="image/png,image/jpeg,image/svg+xml" onChange={(e) => void pickLogo(e.target.files?.[0])} />
        <p className="muted" role="status">
          {typeof logo === 'string' ? `Logo set${logoNote ? `: ${logoNote}` : ''} (${Math.ceil(logo.length / 1365)} kB stored).` : 'No logo: the shop name heads the documents.'}
        </p>
        {typeof logo === 'string' ? <img className="logo-pick__preview" src={logo} alt="The shop's logo as the documents print it" /> : null}
        {typeof logo === 'string' ? <button type="button" className="button button--small" onClick={() => { d.set('shopProfile.logo', undefined); setLogoNote(null); }}>Remove logo</button> : null}
      </div>
    </section>
  );
}

/** The shop's time zone: this computer's first, then UTC and every zone the runtime knows, the one set kept. */
function TimeZoneSelect() {
  const d = useSettingsDraft();
  const set = d.get('defaults.timeZone');
  const here = Intl.DateTimeFormat().resolvedOptions().timeZone;
  const zones = [...new Set([here, 'UTC', ...(typeof set === 'string' ? [set] : []), ...Intl.supportedValuesOf('timeZone')])];
  return (
    <SSelect path="defaults.timeZone" label="Shop's time zone" hint="The days on the screens, documents and job list ranges are its days."
      choices={zones.map((z) => ({ value: z, label: z === here ? `${z} (this computer)` : z }))} />
  );
}

export function DefaultsSection() {
  return (
    <section className="settings-section" id="settings-defaults" aria-labelledby="settings-defaults-title">
      <h2 id="settings-defaults-title">Defaults</h2>
      <div className="grid grid--5">
        <SSelect path="defaults.units" label="Units of new jobs" choices={[{ value: 'metric', label: 'Metric (mm, N)' }, { value: 'inch', label: 'Inch (in, lbf)' }]} />
        <SSelect path="defaults.toleranceGrade" label="Tolerance grade" asNumber
          choices={[{ value: '1', label: 'Grade 1 (fine)' }, { value: '2', label: 'Grade 2 (medium)' }, { value: '3', label: 'Grade 3 (coarse)' }]} />
        <SSelect path="defaults.paperSize" label="Paper" choices={[{ value: 'letter', label: 'Letter' }, { value: 'a4', label: 'A4' }]} />
        <SText path="defaults.currency" label="Currency (ISO code)" placeholder="USD" />
        <SNumber path="defaults.quoteValidityDays" label="Quotes valid for" unit="days" />
        <SSelect path="defaults.setRemovalMethod" label="Set removal routed by"
          choices={[{ value: 'stricter', label: 'The stricter method' }, { value: 'handbook', label: 'Handbook (Shigley Table 10-6)' }, { value: 'en13906', label: 'EN 13906-1 static' }]} />
        <SSelect path="defaults.decimalMark" label="Decimal mark in typed numbers"
          choices={[{ value: '.', label: 'Point: 1.6 and 2,000' }, { value: ',', label: 'Comma: 1,6 and 2.000' }]} />
        <TimeZoneSelect />
      </div>
    </section>
  );
}

export function NumberingSection() {
  return (
    <section className="settings-section" id="settings-numbering" aria-labelledby="settings-numbering-title">
      <h2 id="settings-numbering-title">Numbering</h2>
      <p className="muted">{'{yy}'} and {'{yyyy}'} in a prefix become the year: “J-{'{yy}'}-” gives J-26-0001.</p>
      <div className="grid grid--3">
        <SText path="numbering.prefix" label="Job number prefix" />
        <SNumber path="numbering.width" label="Job number digits" />
        <SNumber path="numbering.next" label="Next job number" />
        <SText path="numbering.quotes.prefix" label="Quote number prefix" />
        <SNumber path="numbering.quotes.width" label="Quote number digits" />
        <SNumber path="numbering.quotes.next" label="Next quote number" />
      </div>
    </section>
  );
}
