/**
 * The Lucene index of the catalog (a disposable cache in a folder it owns), the document mapping and the query language; may use catalog, units, yaml and text.
 */
package dev.ampsieve.search;
