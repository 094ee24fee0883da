import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { inputClasses } from '@/components/ui/text-field';

/** Said before inviting when the server has no outgoing mail server: nobody gets an e-mail. */
export function HandDeliveryNotice() {
  return (
    <div role="note" className="rounded-md border border-warn/30 bg-warn-soft px-3 py-2 text-sm text-warn-strong">
      <p className="font-semibold">Invitations are not e-mailed from this Mixwright.</p>
      <p>
        It runs without an outgoing mail server, so nobody receives an e-mail. After you invite someone, copy the link
        shown here and pass it on yourself. It works once, for 7 days, and only for the e-mail address you invite.
      </p>
    </div>
  );
}

/** The one-time link of a new invitation, to copy and pass on by hand. */
export function InvitationLink({ email, link }: { email: string; link: string }) {
  const [copied, setCopied] = useState(false);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(link);
      setCopied(true);
    } catch {
      setCopied(false);
    }
  };
  return (
    <div role="status" className="flex flex-col gap-2 rounded-md border border-accent/30 bg-accent-soft px-3 py-2">
      <p className="text-sm text-accent-strong">
        Invitation for <b>{email}</b> created. Pass this link on to them yourself; it is shown only now.
      </p>
      <div className="flex flex-wrap items-center gap-2">
        <label htmlFor="invitation-link" className="sr-only">
          Invitation link for {email}
        </label>
        <input
          id="invitation-link"
          readOnly
          value={link}
          onFocus={(event) => event.currentTarget.select()}
          className={`${inputClasses} min-w-0 flex-1 font-mono text-sm`}
        />
        <Button type="button" variant="secondary" size="sm" onClick={() => void copy()}>
          {copied ? 'Copied' : 'Copy link'}
        </Button>
      </div>
    </div>
  );
}
