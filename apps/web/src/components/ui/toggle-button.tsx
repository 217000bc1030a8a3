/** A button that stays pressed while its choice is on (aria-pressed): views, sides, filters. */
export function ToggleButton({
  pressed,
  onClick,
  disabled,
  title,
  children,
}: {
  pressed: boolean;
  onClick: () => void;
  disabled?: boolean;
  title?: string;
  children: string;
}) {
  return (
    <button
      type="button"
      aria-pressed={pressed}
      disabled={disabled}
      title={title}
      onClick={onClick}
      className={`inline-flex h-7 items-center rounded-md border px-2 text-[13px] disabled:cursor-not-allowed disabled:opacity-50 ${
        pressed
          ? 'border-line-strong bg-raised text-ink'
          : 'border-line text-ink-muted hover:text-ink'
      }`}
    >
      {children}
    </button>
  );
}
