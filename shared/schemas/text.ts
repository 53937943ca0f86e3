import { z } from 'zod'

// In a /u regular expression a lone UTF-16 surrogate is a code point of its own, category Cs;
// a correctly paired emoji is one astral code point and does not match.
const LONE_SURROGATE = /\p{Cs}/u

/** True unless the string holds half of a UTF-16 pair on its own ("\ud800"), which no database column can store. */
export const isWellFormedText = (value: string) => !LONE_SURROGATE.test(value)

const WELL_FORMED_TEXT = z.string().refine(isWellFormedText, { message: 'Contains a broken character; type it again', abort: true })

/**
 * The one way a schema declares a string. JSON may carry "\ud800", which is not text: MariaDB
 * refuses it with an error (a 500) and other code mangles it. Every string field starts from
 * `text()`, so malformed text is a 400 at the door (lint forbids a bare `z.string()`).
 *
 * One instance for every field: a zod schema never changes (each method returns a new one), and
 * building ~300 of them was a good part of a phone's first second on the Round.
 */
export const text = () => WELL_FORMED_TEXT
