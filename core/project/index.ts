/**
 * Project files: the format (schema, migration, validation), reading and writing, the demo projects,
 * CSV import and export, and the key results per member. See docs/project-format.md.
 */
export * from './types.ts';
export { parseProject, serializeProject, MAX_PROJECT_TEXT_LENGTH, type ParsedProject } from './file.ts';
export { migrateProject, migrateV1ToV2, OLDEST_READABLE_VERSION, type MigrationResult } from './migrate.ts';
export { validateProjectData, validateProject, hasErrors, analysisBlockers, formatDiagnostic, sortDiagnostics, itemPath, pathText } from './validate.ts';
export { projectSchema, unknownFields, canonicalOrder, MAX_NESTING } from './schema.ts';
export { demoProject, demoProjectSI } from './demo.ts';
export { importContinuousMembersCsv, type ContinuousCsvOptions } from './continuous-import.ts';
export { importMembersCsv, resultsSummaryCsv, momentCurvatureCsv, loadDeflectionCsv, spanDistributionCsv, parseCsv, csvField, csvText, defaultImportService, type MemberCsvOptions } from './csv.ts';
export { memberKeyResults, type MemberKeyResults, type CriticalSection } from './key-results.ts';
