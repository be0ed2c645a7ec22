import { SHORT_CAUTION } from '../../core/cautions.ts';
import { formatNumber, formatQuantity } from '../../core/format/number-format.ts';
import type { InputOption } from '../../core/size/one-input-options.ts';
import type { FindingChange } from '../../core/size/size-criterion.ts';
import type { SectionChange } from '../../core/size/size-member.ts';
import type { SizeResult } from '../../core/size/size-run.ts';
import { sizeFound } from '../../core/size/size-run.ts';
import { dimsCell, left, numberCell, percentCell, right, row, severityCell, textCell } from '../model/cells.ts';
import type { Block, ReportDocument, Section, TableBlock } from '../model/document.ts';
import { code, paragraph, plain } from '../model/runs.ts';

// The sizing as a report document: what was found for each member and each
// other failing finding, how it was decided, and the cautions. The Markdown
// and HTML renderers write it out.

const section = (id: string, title: string, blocks: Block[]): Section => ({ id, title, newPage: false, blocks });
const list = (items: string[]): Block => ({ kind: 'list', items: items.map((t) => [plain(t)]) });

const changeText = (c: FindingChange) =>
  `${c.rule} (${c.label}): ${c.from}${c.from_utilisation !== null ? ` ${formatNumber(c.from_utilisation)}` : ''} → ${c.to}${c.to_utilisation !== null ? ` ${formatNumber(c.to_utilisation)}` : ''}`;

const sectionText = (s: SectionChange) => `${s.label}: ${s.fields.join(', ')}`;

function membersTable(r: SizeResult): TableBlock {
  return {
    kind: 'table',
    id: 'size-members',
    columns: [left('Member'), left('As given'), right('Utilisation'), left('Section'), right('From', { unit: 'mm' }), right('To', { unit: 'mm' }), left('From'), right('Utilisation after'), right('Mass change', { unit: 'kg' }), right('Cost change')],
    rows: r.members.flatMap((m) =>
      m.found
        ? m.sections.map((s, i) =>
            row([
              textCell(i === 0 ? `${m.member} (${m.rule})` : ''),
              i === 0 ? severityCell(m.severity) : textCell(''),
              i === 0 ? numberCell(m.utilisation, '') : textCell(''),
              textCell(sectionText(s)),
              dimsCell(s.from, 'mm'),
              dimsCell(s.to, 'mm'),
              textCell(s.basis === 'stock' ? 'stock list' : `size series${s.basis_note ? ` (${s.basis_note})` : ''}`),
              i === 0 ? numberCell(m.utilisation_after, '') : textCell(''),
              i === 0 ? numberCell(m.mass_change_kg, 'kg') : textCell(''),
              i === 0 ? numberCell(m.cost_change, '', { none: 'not priced' }) : textCell(''),
            ]),
          )
        : [row([textCell(`${m.member} (${m.rule})`), severityCell(m.severity), numberCell(m.utilisation, ''), textCell(`none found: ${m.reason ?? ''}`), textCell(''), textCell(''), textCell(''), textCell(''), textCell(''), textCell('')])],
    ),
    empty: 'No member finding warns or fails: nothing to size.',
  };
}

const optionCells = (o: InputOption) => [textCell(o.input), numberCell(o.from, o.unit), numberCell(o.to, o.unit, { sig: 4 }), percentCell(o.change), severityCell(o.to_severity), textCell(o.worse.length ? o.worse.map(changeText).join('; ') : 'none worse')];

function optionsTable(r: SizeResult): TableBlock {
  return {
    kind: 'table',
    id: 'size-options',
    columns: [left('Finding'), left('As given'), left('Input'), right('From'), right('To'), right('Change'), left('Then'), left('Other findings made worse')],
    rows: r.others.flatMap((o) => {
      const head = [textCell(`${o.rule}: ${o.label}`), severityCell(o.severity)];
      const blank = [textCell(''), textCell('')];
      return o.options.length ? o.options.map((x, i) => row([...(i === 0 ? head : blank), ...optionCells(x)])) : [row([...head, textCell(`none found: ${o.reason ?? ''}`), textCell(''), textCell(''), textCell(''), textCell(''), textCell('')])];
    }),
    empty: 'No finding of another rule fails.',
  };
}

function memberDetails(r: SizeResult): Block[] {
  return r.members.flatMap((m) => {
    const lines = [
      ...(m.found ? m.sections.map((s) => `${s.label}: ${s.fields.map((f, i) => `${f} ${formatQuantity(s.from[i], 'mm')} → ${formatQuantity(s.to[i], 'mm')}`).join(', ')}`) : [`none found: ${m.reason ?? ''}`]),
      ...(m.found ? [`mass change ${formatQuantity(m.mass_change_kg, 'kg')}; cost change ${m.cost_change === null ? `not priced (${m.cost_note})` : formatNumber(m.cost_change, 'currency')}`] : []),
      ...(m.risen.length ? [`also raises, within the same severity: ${m.risen.map(changeText).join('; ')}`] : []),
      ...m.rejected.slice(0, 8).map((x) => `turned down: ${x.sections}: ${x.why}`),
      ...(m.rejected.length > 8 ? [`and ${m.rejected.length - 8} more turned down`] : []),
      `trials: ${m.trials.rule} of the rule alone, ${m.trials.whole} of the whole check`,
    ];
    return [{ kind: 'heading', level: 3, text: `${m.member} (${m.rule})` }, list(lines)];
  });
}

export function sizeDocument(r: SizeResult, files: { proposed: string | null }): ReportDocument {
  const found = sizeFound(r);
  const headline = r.members.length === 0 && r.others.length === 0
    ? 'Nothing fails or warns among the members, and no other finding fails: there is nothing to size.'
    : `${r.members.filter((m) => m.found).length} of ${r.members.length} failing or warning members have a passing section; ${r.others.filter((o) => o.options.length).length} of ${r.others.length} other failing findings have a one-input option.`;
  return {
    title: `Sizing: ${r.spec_name}`,
    lede: 'Proposed member sections and one-input options, each found by re-running the check; none is applied to the specification.',
    sections: [
      section('cautions', 'Cautions', [{ kind: 'cautions', items: r.cautions }]),
      section('summary', 'Summary', [
        paragraph(headline),
        ...(r.complete ? [] : [paragraph(`Stopped before the end; not done: ${r.not_done.join('; ')}.`)]),
        ...(r.members.length + r.others.length === 0 ? [] : [paragraph(found ? 'Every failing or warning member has a passing section and every other failing finding an option.' : 'Some finding has no option: see the tables.')]),
        ...(files.proposed ? [paragraph('The specification with every proposed section written in: ', code(files.proposed), '. Check it before building from it.')] : []),
        paragraph(`The build as given: mass ${formatQuantity(r.given.mass_kg, 'kg')}, stock plan cost ${r.given.cost === null ? 'not priced' : formatNumber(r.given.cost, 'currency')}.`),
      ]),
      section('members', 'Member sections', [membersTable(r), ...memberDetails(r)]),
      section('options', 'One-input options for the other failing findings', [optionsTable(r)]),
      section('method', 'How it was decided', [
        list([`Sections from ${r.sections_from}.`, `Smallest: least cross-section area, a tie by the lesser depth (the field named height, depth or thickness; a round bar's diameter).`, `Criterion: ${r.criterion}.`, ...r.notes, `Search: ${formatNumber(r.search.trials, 'count')} partial re-runs of the check.`]),
      ]),
    ],
    closing: SHORT_CAUTION,
  };
}
