import { Component } from 'preact';
import type { CaseSummary } from '../../store';
import { VerdictBadge } from '../results/VerdictBadge';
import { caseRowView } from './format';
import { copyName } from './names';
import { NameForm } from './NameForm';

export type RowEdit = 'rename' | 'duplicate' | null;

interface Props {
  /** The light list row (no full case is needed to show it). */
  c: CaseSummary;
  /** This case is the one open in the app. */
  isOpen: boolean;
  edit: RowEdit;
  onEdit: (edit: RowEdit) => void;
  onOpen: () => void;
  onDelete: () => void;
  /** Resolve to an error message, or null when done (the form closes). */
  onRename: (name: string) => Promise<string | null>;
  onDuplicate: (name: string) => Promise<string | null>;
}

/** One saved case: name, kind, tag, date, key result, and its actions. Every text from the case is rendered as text. */
export function CaseRow({ c, isOpen, edit, onEdit, onOpen, onDelete, onRename, onDuplicate }: Props) {
  const v = caseRowView(c);
  const nameId = `case-${c.id}-name`;
  return (
    <li class="case-row">
      <div class="case-row-main">
        <h3 class="case-name" id={nameId}>
          {v.name}
          {isOpen && <span class="case-open-mark"> (open now)</span>}
        </h3>
        <p class="case-meta">
          <span>{v.kind}</span>
          {v.tag && (
            <span>
              <span class="vh">Tag: </span>
              <span class="case-tag">{v.tag}</span>
            </span>
          )}
          <span>
            Changed <time dateTime={c.updatedAt}>{v.updated}</time>
          </span>
        </p>
        <p class="case-result">
          <span class="case-result-label">Lowest wet frequency:</span> <span class="case-frequency">{v.resultText}</span>
          {v.verdict && (
            <span class="case-verdict">
              <span class="vh">Resonance verdict: </span>
              <VerdictBadge verdict={v.verdict} />
            </span>
          )}
          {v.bandVerdict && (
            <span class="case-verdict" data-testid="case-band-verdict">
              <span class="case-result-label">over the ranges:</span> <VerdictBadge verdict={v.bandVerdict} />
            </span>
          )}
        </p>
      </div>
      <div class="case-actions">
        <button type="button" class="btn primary" onClick={onOpen}>
          Open<span class="vh"> {v.name}</span>
        </button>
        <button type="button" class="btn" aria-expanded={edit === 'duplicate'} onClick={() => onEdit(edit === 'duplicate' ? null : 'duplicate')}>
          Duplicate<span class="vh"> {v.name}</span>
        </button>
        <button type="button" class="btn" aria-expanded={edit === 'rename'} onClick={() => onEdit(edit === 'rename' ? null : 'rename')}>
          Rename<span class="vh"> {v.name}</span>
        </button>
        <button type="button" class="btn cases-danger" onClick={onDelete}>
          Delete<span class="vh"> {v.name}</span>
        </button>
      </div>
      {edit === 'rename' && (
        <NameForm label="New name" initial={c.name} submitLabel="Rename" onSubmit={onRename} onCancel={() => onEdit(null)} />
      )}
      {edit === 'duplicate' && (
        <NameForm label="Name of the copy" initial={copyName(c.name)} submitLabel="Duplicate" onSubmit={onDuplicate} onCancel={() => onEdit(null)} />
      )}
    </li>
  );
}

/**
 * A row drawn again only when its case, its open mark or its edit form changes: typing a search or adding a page
 * does not redraw the rows already on screen. Its handlers only call the list's stable actions, so the ones it was
 * drawn with stay right.
 */
export class StableCaseRow extends Component<Props> {
  override shouldComponentUpdate(next: Props): boolean {
    const p = this.props;
    return next.c !== p.c || next.isOpen !== p.isOpen || next.edit !== p.edit;
  }

  render() {
    return <CaseRow {...this.props} />;
  }
}
