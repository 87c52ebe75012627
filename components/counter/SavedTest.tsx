'use client';

import { Fragment, type ReactElement } from 'react';
import Link from '@/components/ui/Link';
import { Notice } from '@/components/ui/Notice';
import { link } from '@/components/ui/styles';
import { SendSlipButton } from './SendSlipButton';

/** What saving a counter test answers: a counter lamp, or the lamp in a keeper's enclosure the reading went to. */
export type SavedTest = {
  lampId: number | null;
  customerId: number | null;
  enclosureLamp?: { id: number; enclosureId: number; label: string };
};

/** The counter's "Saved" notice: where the test went and what to do next, as one line of links. */
export function SavedTestNotice({ saved }: { saved: SavedTest }) {
  const { enclosureLamp, customerId, lampId } = saved;
  const links = [
    enclosureLamp ? (
      <Link key="lamps" href={`/enclosures/${enclosureLamp.enclosureId}/lamps`} className={link}>
        Open the enclosure’s lamps
      </Link>
    ) : (
      <Link key="lamp" href={`/counter/lamps/${lampId}`} className={link}>
        Open the lamp and its readings
      </Link>
    ),
    customerId && (
      <Link key="customer" href={`/customers/${customerId}`} className={link}>
        the customer
      </Link>
    ),
    // The slip is a counter lamp's; a reading that went to the lamp log has none.
    !enclosureLamp && (
      <a key="slip" href={`/api/counter/lamps/${lampId}/slip`} download className={link}>
        Test slip (PDF)
      </a>
    ),
    <a key="next" href="/counter" className={link}>
      Test another lamp
    </a>,
  ].filter((node): node is ReactElement => typeof node === 'object' && node !== null);
  return (
    <Notice tone="success" title="Saved">
      <p>
        {enclosureLamp && <>The reading was added to {enclosureLamp.label} in the lamp log. </>}
        {links.map((node, i) => (
          <Fragment key={node.key}>
            {i > 0 && ' · '}
            {node}
          </Fragment>
        ))}
      </p>
      {customerId && lampId && (
        <div className="mt-2">
          <SendSlipButton lampId={lampId} />
        </div>
      )}
    </Notice>
  );
}
