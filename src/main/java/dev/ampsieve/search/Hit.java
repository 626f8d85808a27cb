package dev.ampsieve.search;

/** One part found: its id and relevance (free words found, title words counting double). */
public record Hit(String id, float score) {}
