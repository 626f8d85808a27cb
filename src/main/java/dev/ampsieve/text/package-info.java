/**
 * Text safety shared by every package: control characters from data shown as escapes, spreadsheet formula cells neutralised; imports nothing.
 */
package dev.ampsieve.text;
