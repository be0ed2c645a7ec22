import { deflateRawSync } from 'node:zlib';
import type { DeflateRaw } from '../render/zip-deflate.ts';

// Node's zlib for the workbooks a command writes: the workbook library's own
// deflate, written in JavaScript, took most of a workbook's writing time in a
// fresh process (it is cold there, and sets up its tables for every entry).

export const nativeDeflateRaw: DeflateRaw = (data) => deflateRawSync(data);
