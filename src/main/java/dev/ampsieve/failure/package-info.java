/**
 * What a user can cause and how it ends: the sealed user-error base with its typed place, and the exit codes; imports nothing but text, so every package may use it.
 */
package dev.ampsieve.failure;
