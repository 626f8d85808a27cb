/**
 * The program's entry point alone: Main chooses between the interactive shell and one command; may use commands and shell.
 */
package dev.ampsieve.cli;
