/**
 * The interactive front end: JLine shell, guided stage entry, completion and the current stage; may use every package below it.
 */
package dev.ampsieve.shell;
