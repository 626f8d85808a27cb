/**
 * Every rendering of results in words, tables, charts, JSON and CSV, and the caution text; may use every domain package, never the front ends.
 */
package dev.ampsieve.report;
