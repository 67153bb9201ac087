// A comment box that suggests teammates' logins while "@" is being typed.
import { Classes } from '@blueprintjs/core';
import { useId, useRef, useState, type KeyboardEvent } from 'react';
import { activeMention, type ActiveMention } from '../utils/activeMention.js';
import { completeMention } from '../utils/completeMention.js';
import { mentionSuggestions } from '../utils/mentionSuggestions.js';

export type MentionTextAreaProps = {
  /** Accessible name of the box. */
  label: string;
  value: string;
  onChange: (value: string) => void;
  /** Teammates that can be mentioned. */
  members: readonly { login: string; name: string }[];
};

/** Arrow keys move through the suggestions, Enter or Tab picks one, Escape closes the list. */
export function MentionTextArea({ label, value, onChange, members }: MentionTextAreaProps) {
  const ref = useRef<HTMLTextAreaElement>(null);
  const [mention, setMention] = useState<ActiveMention | null>(null);
  const [highlighted, setHighlighted] = useState(0);
  const listId = useId();
  const textId = useId();
  const suggestions = mention ? mentionSuggestions(members, mention.query) : [];
  const open = mention !== null && suggestions.length > 0;

  const track = (text: string, caret: number) => {
    setMention(activeMention(text, caret));
    setHighlighted(0);
  };
  const pick = (login: string) => {
    const caret = ref.current?.selectionStart ?? value.length;
    if (!mention) return;
    const done = completeMention(value, caret, mention, login);
    onChange(done.text);
    setMention(null);
    requestAnimationFrame(() => {
      ref.current?.focus();
      ref.current?.setSelectionRange(done.caret, done.caret);
    });
  };
  const onKeyDown = (e: KeyboardEvent<HTMLTextAreaElement>) => {
    if (!open) return;
    if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      e.preventDefault();
      const step = e.key === 'ArrowDown' ? 1 : -1;
      setHighlighted((h) => (h + step + suggestions.length) % suggestions.length);
    } else if (e.key === 'Enter' || e.key === 'Tab') {
      e.preventDefault();
      const chosen = suggestions[highlighted];
      if (chosen) pick(chosen.login);
    } else if (e.key === 'Escape') {
      e.preventDefault();
      setMention(null);
    }
  };

  return (
    <div className="hx-mention-box">
      <label htmlFor={textId} className={Classes.LABEL}>
        {label}
      </label>
      <textarea
        id={textId}
        ref={ref}
        className={`${Classes.INPUT} ${Classes.FILL}`}
        rows={3}
        maxLength={5000}
        value={value}
        aria-autocomplete="list"
        aria-controls={open ? listId : undefined}
        aria-activedescendant={open ? `${listId}-${highlighted}` : undefined}
        onChange={(e) => {
          onChange(e.target.value);
          track(e.target.value, e.target.selectionStart);
        }}
        onKeyDown={onKeyDown}
        onBlur={() => setTimeout(() => setMention(null), 150)}
      />
      {open ? (
        <ul id={listId} role="listbox" aria-label="Teammates to mention" className="hx-mention-list">
          {suggestions.map((m, i) => (
            <li
              key={m.login}
              id={`${listId}-${i}`}
              role="option"
              aria-selected={i === highlighted}
              className={i === highlighted ? 'hx-mention-option hx-active' : 'hx-mention-option'}
              onMouseDown={(e) => {
                e.preventDefault();
                pick(m.login);
              }}
            >
              <span className="hx-mono">@{m.login}</span> <span className="hx-muted">{m.name}</span>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
