export {
  binaryStlByteLength,
  DEFAULT_STL_HEADER,
  STL_HEADER_BYTES,
  STL_RECORD_BYTES,
  writeBinaryStl,
} from './write-binary-stl';
export { writeAsciiStl } from './write-ascii-stl';
