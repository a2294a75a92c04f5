import { Link, type LinkProps } from 'react-router-dom';
import { cn } from '#src/lib/cn.ts';

/** An in-app link in the cool accent, underlined so it is not told by colour alone. */
export function TextLink({ className, ...rest }: LinkProps) {
  return <Link className={cn('font-medium text-link underline hover:no-underline', typeof className === 'string' ? className : undefined)} {...rest} />;
}
