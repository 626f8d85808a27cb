/**
 * The command tree both front ends run (picocli), the stage source a command takes its stage from, the one failure handler and the shared option mixins; may use every domain package and report.
 */
package dev.ampsieve.commands;
