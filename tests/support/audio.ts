/** Four silent-looking MPEG-1 Layer III frame headers with empty bodies: enough for file-type to say MP3; test data only. */
export function tinyMp3(): Buffer {
  const frame = Buffer.concat([Buffer.from([0xff, 0xfb, 0x90, 0x64]), Buffer.alloc(413)]);
  return Buffer.concat([frame, frame, frame, frame]);
}
