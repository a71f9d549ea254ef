import { Alert } from './alert.tsx';

export interface LiveMessageValue {
  tone: 'success' | 'error';
  text: string;
}

/**
 * The outcome of an action, announced politely: the live region is always in the page, so a
 * message put into it is read out even though focus is elsewhere.
 */
export function LiveMessage({ message }: { message: LiveMessageValue | null }) {
  return (
    <div aria-live="polite" className="empty:hidden">
      {message ? (
        <Alert tone={message.tone} live={false}>
          {message.text}
        </Alert>
      ) : null}
    </div>
  );
}
