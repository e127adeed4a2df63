import { describe, expect, it } from 'vitest';
import { aboutDetail, RESULTS_CAUTION } from '../../../app/shared/about.ts';
import {
  baseName,
  exportTypeFor,
  isProjectFileName,
  sanitizeFileName,
  withExtension,
  withProjectExtension,
} from '../../../app/shared/file-types.ts';

describe('project file names', () => {
  it('end in .hingeline exactly once, whatever the suggested name ended with', () => {
    expect(withProjectExtension('Beam B1')).toBe('Beam B1.hingeline');
    expect(withProjectExtension('Beam B1.hingeline')).toBe('Beam B1.hingeline');
    expect(withProjectExtension('Beam B1.hingeline.json')).toBe('Beam B1.hingeline');
    expect(withProjectExtension('Beam B1.JSON')).toBe('Beam B1.hingeline');
    expect(withProjectExtension('.json')).toBe('Untitled.hingeline');
  });

  it('are recognised by .hingeline or .json, in any case', () => {
    expect(['a.hingeline', 'a.HINGELINE', 'a.json', 'a.hingeline.json'].every(isProjectFileName)).toBe(true);
    expect(['a.pdf', 'a.hingeline.bak', 'hingeline'].some(isProjectFileName)).toBe(false);
  });
});

describe('sanitizeFileName', () => {
  it('replaces characters no operating system allows in names', () => {
    expect(sanitizeFileName('Beam 1/2: "east" <edge>?*|')).toBe('Beam 1-2- -east- -edge----');
  });

  it('falls back for empty, dot-only and reserved Windows device names', () => {
    expect(sanitizeFileName('   ')).toBe('Untitled');
    expect(sanitizeFileName('...')).toBe('Untitled');
    expect(sanitizeFileName('CON')).toBe('Untitled');
    expect(sanitizeFileName('lpt1.txt', 'Export')).toBe('Export');
  });

  it('keeps names to 200 characters', () => {
    expect(sanitizeFileName('x'.repeat(500))).toHaveLength(200);
  });
});

describe('export types and names', () => {
  it('know PDF and CSV and nothing executable', () => {
    expect(exportTypeFor('application/pdf')?.extension).toBe('.pdf');
    expect(exportTypeFor('text/csv')?.extension).toBe('.csv');
    expect(exportTypeFor('text/html')).toBeNull();
    expect(exportTypeFor('application/octet-stream')).toBeNull();
  });

  it('append an extension only when missing', () => {
    expect(withExtension('report', '.pdf')).toBe('report.pdf');
    expect(withExtension('report.PDF', '.pdf')).toBe('report.PDF');
  });

  it('baseName handles both separators', () => {
    expect(baseName('/home/e/a.hingeline')).toBe('a.hingeline');
    expect(baseName('C:\\jobs\\b.hingeline')).toBe('b.hingeline');
    expect(baseName('')).toBe('');
  });
});

describe('About text', () => {
  it('states the version and the caution that results need review by a qualified engineer', () => {
    const detail = aboutDetail({ app: '0.1.0', electron: '45.5.0', chrome: '142.0', node: '22.20.0' });
    expect(detail).toContain('Version 0.1.0');
    expect(detail).toContain('Electron 45.5.0');
    expect(detail).toContain(RESULTS_CAUTION);
    expect(RESULTS_CAUTION).toMatch(/qualified engineer.*local codes and licensed practice/);
  });
});
