import {parse} from 'csv-parse/sync';
import {beforeAll, describe, expect, it} from 'vitest';
import type {CompiledReport} from '../../src/compile-report.js';
import {csvColumns, csvField, csvNumber} from '../../src/render/table-csv.js';
import {compileFiles, fixtureFiles} from '../helpers/render-fixture.js';

type Row = Record<(typeof csvColumns)[number], string>;
type Json = {blocks: Record<string, any>};

describe('tables/ID.csv', () => {
  let report: CompiledReport;
  let json: Json;
  const rows = (id: string): Row[] => parse(report.files.get(`tables/${id}.csv`)!, {columns: true, bom: true}) as Row[];
  /** The CSV's number, read as an analyst's program would. */
  const value = (id: string, match: Partial<Row>): number => {
    const found = rows(id).filter((row) => Object.entries(match).every(([key, v]) => row[key as keyof Row] === v));
    expect(found, JSON.stringify(match)).toHaveLength(1);
    const text = found[0]!.value;
    return text === 'Inf' ? Infinity : text === '-Inf' ? -Infinity : Number(text);
  };

  beforeAll(async () => {
    report = await compileFiles(fixtureFiles(), ['json']);
    json = JSON.parse(report.files.get('report.results.json')!) as Json;
  });

  it('is written for every block, even without md, html or tex', () => {
    expect(Object.keys(json.blocks).map((id) => report.files.has(`tables/${id}.csv`))).toEqual(Object.keys(json.blocks).map(() => true));
    expect([...report.files.keys()].some((file) => file.endsWith('.tex'))).toBe(false);
  });

  it('has the header row and CRLF line ends of RFC 4180', () => {
    const text = report.files.get('tables/lean-rich.csv')!;
    expect(text.startsWith(`${csvColumns.join(',')}\r\n`)).toBe(true);
    expect(text.endsWith('\r\n')).toBe(true);
    expect(text.replaceAll('\r\n', '')).not.toContain('\n');
  });

  it('gives the JSON’s unrounded numbers exactly', () => {
    for (const [id, block] of Object.entries(json.blocks)) {
      for (const [level, group] of Object.entries(block.groups as Record<string, Record<string, number>>)) {
        for (const [quantity, number] of Object.entries(group)) expect(value(id, {section: 'group', level, quantity})).toBe(number);
      }
      for (const [i, check] of (block.assumptions as {check: string; group?: string; statistic: number; p: number}[]).entries()) {
        expect(value(id, {section: 'assumption', item: check.check, level: check.group ?? '', quantity: 'p'}), `${id} check ${i}`).toBe(check.p);
      }
      if (block.p === undefined) continue;
      expect(value(id, {section: 'test', quantity: 'statistic'})).toBe(block.statistic.value);
      expect(value(id, {section: 'test', quantity: 'p'})).toBe(block.p);
      if (block.estimate) {
        expect(value(id, {section: 'estimate', quantity: 'value'})).toBe(block.estimate.value);
        expect(value(id, {section: 'estimate', quantity: 'ci_lower'})).toBe(block.estimate.ci[0]);
        expect(value(id, {section: 'estimate', quantity: 'ci_upper'})).toBe(block.estimate.ci[1]);
      }
      if (block.effect) expect(value(id, {section: 'effect', quantity: 'value'})).toBe(block.effect.value);
    }
  });

  it('writes df, adjusted p, post-hoc comparisons and method-specific numbers', () => {
    const welch = json.blocks['lean-rich'];
    expect(value('lean-rich', {section: 'test', quantity: 'df'})).toBe(welch.df);
    expect(value('lean-rich', {section: 'test', item: 'holm', quantity: 'p_adjusted'})).toBe(welch.p_adjusted);
    const anova = json.blocks['mixes'];
    expect(value('mixes', {section: 'test', quantity: 'df1'})).toBe(anova.df[0]);
    expect(value('mixes', {section: 'test', quantity: 'df2'})).toBe(anova.df[1]);
    const first = anova.posthoc[0];
    expect(value('mixes', {section: 'posthoc', level: first.a, other_level: first.b, quantity: 'p_adjusted'})).toBe(first.p_adjusted);
    expect(value('mixes', {section: 'detail', quantity: 'anova_table.within.ss'})).toBe(anova.anova_table.within.ss);
    const slope = json.blocks['water'].coefficients[1];
    expect(value('water', {section: 'detail', item: slope.term, quantity: 'coefficients.se'})).toBe(slope.se);
    expect(value('water', {section: 'detail', item: slope.term, quantity: 'coefficients.ci.1'})).toBe(slope.ci[1]);
    expect(rows('mixes').find((row) => row.quantity === 'p_adjusted' && row.section === 'test')!.value).toBe('');
  });

  it('describes a describe block by its groups and rows alone', () => {
    expect(new Set(rows('spread').map((row) => row.section))).toEqual(new Set(['group', 'rows']));
  });
});

describe('csvField and csvNumber', () => {
  it('quote fields with commas, quotes and line breaks, doubling quotes', () => {
    expect(csvField('plain <b>&</b>')).toBe('plain <b>&</b>');
    expect(csvField('B, "the other"')).toBe('"B, ""the other"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
  });

  it('write shortest round-trip numbers, Inf for open bounds and nothing for null', () => {
    expect(csvNumber(0.1 + 0.2)).toBe('0.30000000000000004');
    expect(csvNumber(5.389916782089004e-8)).toBe('5.389916782089004e-8');
    expect(csvNumber(-Infinity)).toBe('-Inf');
    expect(csvNumber(null)).toBe('');
  });
});
