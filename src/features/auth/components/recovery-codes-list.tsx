import { Copy, Download } from 'lucide-react';
import { useState } from 'react';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';

type RecoveryCodesListProps = {
  codes: string[];
  email: string;
  onDone: () => void;
};

function codesFileText(codes: string[], email: string) {
  return [
    `Pourscope recovery codes for ${email}`,
    `Made ${new Date().toISOString().slice(0, 10)}`,
    '',
    ...codes,
    '',
    'Each code signs you in once, in place of the code from your authenticator app.',
    'Keep this file away from your phone.',
    '',
  ].join('\n');
}

/**
 * The recovery codes, shown once, right after they were made: they are
 * stored only as hashes, so nobody can show them again.
 */
export function RecoveryCodesList({ codes, email, onDone }: RecoveryCodesListProps) {
  const [copied, setCopied] = useState<'copied' | 'failed' | null>(null);

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(codes.join('\n'));
      setCopied('copied');
    } catch {
      setCopied('failed');
    }
  };

  const download = () => {
    const url = URL.createObjectURL(new Blob([codesFileText(codes, email)], { type: 'text/plain' }));
    const link = document.createElement('a');
    link.href = url;
    link.download = 'pourscope-recovery-codes.txt';
    link.click();
    URL.revokeObjectURL(url);
  };

  return (
    <div className="flex flex-col gap-4">
      <Notice tone="caution" title="Store these recovery codes somewhere safe now">
        <p>
          If your phone is lost or broken, each code lets you sign in once instead of the code from the app. This is the only time
          Pourscope shows them: print them, or keep them in a password manager, but not on the phone that has the app.
        </p>
      </Notice>
      <ol aria-label="Recovery codes" className="grid grid-cols-1 gap-2 sm:grid-cols-2">
        {codes.map((code) => (
          <li key={code} className="figures rounded-md border border-line bg-surface-sunken px-3 py-2 font-mono text-body">
            {code}
          </li>
        ))}
      </ol>
      <div className="flex flex-wrap gap-3">
        <Button icon={<Copy aria-hidden className="size-4" />} onClick={() => void copy()}>
          Copy the codes
        </Button>
        <Button icon={<Download aria-hidden className="size-4" />} onClick={download}>
          Download as a text file
        </Button>
      </div>
      <p role="status" className="text-caption text-ink-muted">
        {copied === 'copied' ? 'Copied. Paste them somewhere safe.' : copied === 'failed' ? 'Copying did not work here; download the file instead.' : ''}
      </p>
      <Button variant="primary" className="self-start" onClick={onDone}>
        I have stored them
      </Button>
    </div>
  );
}
