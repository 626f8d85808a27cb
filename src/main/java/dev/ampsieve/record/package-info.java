/**
 * Decision records as facts: what a record of a part choice embeds (each part's catalog entry in a
 * canonical form with its hash, verdicts, limiting terms, the cheapest fitting part) and the
 * re-check's findings against today's catalog; may use advice, budget and the packages below
 * them. The words and the file formats live in {@code report}.
 */
package dev.ampsieve.record;
