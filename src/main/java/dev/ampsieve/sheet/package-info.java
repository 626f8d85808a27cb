/**
 * Spreadsheet (CSV) import and export of catalog parts; may use catalog, units, yaml and text.
 */
package dev.ampsieve.sheet;
