/**
 * Every rendering of results in words, tables, charts, JSON and CSV, the words of the loaders' problem facts, and the caution text; may use every domain package, never the front ends.
 */
package dev.ampsieve.report;
