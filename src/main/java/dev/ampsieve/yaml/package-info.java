/**
 * YAML read with line and column for every value, bounded in size and depth, and the located problems (told in words or as a loader's facts) and typed field readers built on it; may use units and text.
 */
package dev.ampsieve.yaml;
