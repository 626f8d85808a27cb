/**
 * The command-line front end: the picocli command tree, exit codes and output guarding; may use every package below it.
 */
package dev.ampsieve.cli;
