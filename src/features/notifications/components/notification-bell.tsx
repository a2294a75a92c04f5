import { useQuery } from '@tanstack/react-query';
import { Bell } from 'lucide-react';
import { useEffect, useId, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '#src/components/ui/button.tsx';
import { safeNextPath } from '#src/config/paths.ts';
import { cn } from '#src/lib/cn.ts';
import { formatDateTime } from '#src/lib/format.ts';
import { notificationQueries, useMarkAllNotificationsRead, useMarkNotificationRead } from '../api/notification-queries.ts';

/** The top bar's bell: the unread count in a badge and in words, and a list that opens on a tap or Enter. */
export function NotificationBell() {
  const { data } = useQuery(notificationQueries.list());
  const markRead = useMarkNotificationRead();
  const markAll = useMarkAllNotificationsRead();
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const wrapper = useRef<HTMLDivElement>(null);
  const unread = data?.unreadCount ?? 0;

  // Close on Escape or a tap outside: a popover, not a page.
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && setOpen(false);
    const onDown = (e: PointerEvent) => {
      if (wrapper.current && !wrapper.current.contains(e.target as Node)) setOpen(false);
    };
    document.addEventListener('keydown', onKey);
    document.addEventListener('pointerdown', onDown);
    return () => {
      document.removeEventListener('keydown', onKey);
      document.removeEventListener('pointerdown', onDown);
    };
  }, [open]);

  return (
    <div ref={wrapper} className="relative">
      <Button
        variant="quiet"
        aria-expanded={open}
        aria-controls={panelId}
        aria-label={unread > 0 ? `Notifications, ${unread} unread` : 'Notifications, none unread'}
        onClick={() => setOpen((o) => !o)}
        className="relative min-w-12 px-2"
      >
        <Bell aria-hidden className="size-5" />
        {unread > 0 ? (
          <span aria-hidden className="absolute top-1 right-1 min-w-5 rounded-full bg-accent px-1 font-mono text-caption leading-5 text-on-accent tabular-nums">
            {unread > 99 ? '99+' : unread}
          </span>
        ) : null}
      </Button>
      {open ? (
        <div id={panelId} role="region" aria-label="Notifications" className="fixed inset-x-2 top-16 z-40 max-h-[70vh] overflow-y-auto rounded-lg border border-line bg-surface-raised p-3 shadow-lg sm:absolute sm:inset-x-auto sm:top-full sm:right-0 sm:w-96">
          <div className="mb-2 flex items-center justify-between gap-2">
            <p className="font-semibold text-ink">{unread > 0 ? `${unread} unread` : 'All read'}</p>
            {unread > 0 ? (
              <Button size="sm" variant="quiet" pending={markAll.isPending} onClick={() => markAll.mutate()}>
                Mark all read
              </Button>
            ) : null}
          </div>
          {data && data.items.length === 0 ? <p className="text-body text-ink-muted">Nothing yet. Reviews, comments and mentions arrive here.</p> : null}
          <ul className="flex flex-col gap-1">
            {(data?.items ?? []).map((n) => (
              <li key={n.id} className={cn('rounded-md p-2', n.readAt ? '' : 'bg-info-bg')}>
                <Link
                  to={safeNextPath(n.link)}
                  onClick={() => {
                    if (!n.readAt) markRead.mutate(n.id);
                    setOpen(false);
                  }}
                  className="block text-body text-ink underline-offset-2 hover:underline focus-visible:underline"
                >
                  <span className="font-semibold">{n.readAt ? '' : 'New: '}{n.title}</span>
                  <span className="block text-caption text-ink-muted">
                    {n.body} · {n.workshopName} · {formatDateTime(n.createdAt)}
                  </span>
                </Link>
                {!n.readAt ? (
                  <Button size="sm" variant="quiet" onClick={() => markRead.mutate(n.id)}>
                    Mark read
                  </Button>
                ) : null}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
