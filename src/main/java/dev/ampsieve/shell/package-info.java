/**
 * The interactive front end: JLine shell, guided stage entry, completion and the current stage, held in memory; may use commands and every package below it.
 */
package dev.ampsieve.shell;
