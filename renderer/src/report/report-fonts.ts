/**
 * The report's fonts in the browser: Roboto from pdfmake's virtual file system, and the Noto
 * fallbacks (Hebrew, Arabic, emoji, mathematical symbols) as build assets fetched when the first report is made. Gives
 * pdfmake's virtual file system (base64 by file key, as core/report/fonts.ts names the files) and
 * the metrics for the charts and the script fallback — the same files as the command line uses.
 */
import vfs from 'pdfmake/build/vfs_fonts.js';
import hebrewRegular from '@expo-google-fonts/noto-sans-hebrew/400Regular/NotoSansHebrew_400Regular.ttf?url';
import hebrewMedium from '@expo-google-fonts/noto-sans-hebrew/500Medium/NotoSansHebrew_500Medium.ttf?url';
import arabicRegular from '@expo-google-fonts/noto-sans-arabic/400Regular/NotoSansArabic_400Regular.ttf?url';
import arabicMedium from '@expo-google-fonts/noto-sans-arabic/500Medium/NotoSansArabic_500Medium.ttf?url';
import emojiRegular from '@expo-google-fonts/noto-emoji/400Regular/NotoEmoji_400Regular.ttf?url';
import emojiMedium from '@expo-google-fonts/noto-emoji/500Medium/NotoEmoji_500Medium.ttf?url';
import mathRegular from '@expo-google-fonts/noto-sans-math/400Regular/NotoSansMath_400Regular.ttf?url';
import { FALLBACK_FONTS, reportFontFiles, reportFontSet } from '../../../core/report/fonts.ts';
import type { ReportFontSet } from '../../../core/report/scripts.ts';

const ASSETS: Readonly<Record<string, string>> = {
  [`${FALLBACK_FONTS.NotoSansHebrew.package}/${FALLBACK_FONTS.NotoSansHebrew.normal}`]: hebrewRegular,
  [`${FALLBACK_FONTS.NotoSansHebrew.package}/${FALLBACK_FONTS.NotoSansHebrew.bold}`]: hebrewMedium,
  [`${FALLBACK_FONTS.NotoSansArabic.package}/${FALLBACK_FONTS.NotoSansArabic.normal}`]: arabicRegular,
  [`${FALLBACK_FONTS.NotoSansArabic.package}/${FALLBACK_FONTS.NotoSansArabic.bold}`]: arabicMedium,
  [`${FALLBACK_FONTS.NotoEmoji.package}/${FALLBACK_FONTS.NotoEmoji.normal}`]: emojiRegular,
  [`${FALLBACK_FONTS.NotoEmoji.package}/${FALLBACK_FONTS.NotoEmoji.bold}`]: emojiMedium,
  [`${FALLBACK_FONTS.NotoSansMath.package}/${FALLBACK_FONTS.NotoSansMath.normal}`]: mathRegular,
};

function bytesOf(base64: string): Uint8Array<ArrayBuffer> {
  const text = atob(base64);
  const out = new Uint8Array(text.length);
  for (let i = 0; i < text.length; i++) out[i] = text.charCodeAt(i);
  return out;
}

function base64Of(bytes: Uint8Array): string {
  let text = '';
  const step = 0x8000;
  for (let i = 0; i < bytes.length; i += step) text += String.fromCharCode(...bytes.subarray(i, i + step));
  return btoa(text);
}

export interface BrowserReportFonts {
  /** pdfmake's virtual file system: base64 content by file key. */
  readonly vfs: Record<string, string>;
  readonly fonts: ReportFontSet;
}

/** Loads every report font (the fallbacks over the network from this origin) and reads their metrics. */
export async function loadReportFonts(fetchAsset: (url: string) => Promise<ArrayBuffer> = async (url) => (await fetch(url)).arrayBuffer()): Promise<BrowserReportFonts> {
  const files = { ...((vfs as unknown as { default?: Record<string, string> }).default ?? (vfs as unknown as Record<string, string>)) };
  const bytes = new Map<string, Uint8Array>();
  await Promise.all(Object.entries(ASSETS).map(async ([key, url]) => {
    const data = new Uint8Array(await fetchAsset(url));
    bytes.set(key, data);
    files[key] = base64Of(data);
  }));
  for (const { file } of reportFontFiles()) if (!bytes.has(file) && files[file]) bytes.set(file, bytesOf(files[file]!));
  const fonts = reportFontSet((file) => {
    const found = bytes.get(file);
    if (!found) throw new Error('the file was not loaded');
    return found;
  });
  return { vfs: files, fonts };
}
