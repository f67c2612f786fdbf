/**
 * `loftpoint evaluate --csv`: the boundaries CSV, written by the chart module
 * the designer window uses too, so both give the same file.
 */
// @ts-nocheck

export { evaluationCsv, type CsvInput } from '../chart/boundaries-csv';
