import { describe, expect, it } from 'vitest';
import { MediaFailure } from './media-failure';
import { describeProbe } from './probe';

const video = (extra: Record<string, unknown> = {}) => ({
  index: 0,
  codec_type: 'video',
  codec_name: 'h264',
  width: 1920,
  height: 1080,
  sample_aspect_ratio: '1:1',
  pix_fmt: 'yuv420p',
  r_frame_rate: '30/1',
  avg_frame_rate: '30/1',
  start_time: '0.000000',
  duration: '10.000000',
  ...extra,
});
const audio = { index: 1, codec_type: 'audio', codec_name: 'aac', channels: 2, duration: '10.02' };
const format = {
  format_name: 'mov,mp4,m4a,3gp,3g2,mj2',
  duration: '10.020000',
  start_time: '0.000000',
  bit_rate: '12000000',
  size: '15030000',
};

describe('describeProbe', () => {
  it('reads duration, size, rate, codecs and bitrate', () => {
    const { probe, videoEndSeconds, ratesAgree } = describeProbe({ streams: [video(), audio], format });
    expect(probe).toEqual({
      formatName: 'mov,mp4,m4a,3gp,3g2,mj2',
      durationSeconds: 10.02,
      width: 1920,
      height: 1080,
      displayWidth: 1920,
      displayHeight: 1080,
      frameRate: 30,
      videoCodec: 'h264',
      audioCodec: 'aac',
      bitrate: 12_000_000,
      rotation: 0,
      pixelFormat: 'yuv420p',
      hasAudio: true,
      audioChannels: 2,
      interlaced: false,
    });
    expect(videoEndSeconds).toBe(10);
    expect(ratesAgree).toBe(true);
  });

  // libavutil/display.h: av_display_rotation_get() returns the counter-clockwise angle, which ffprobe
  // prints as "rotation"; a phone held upright stores a matrix that reads -90 (turn 90 clockwise).
  it.each([
    [-90, 90],
    [90, 270],
    [180, 180],
    [-180, 180],
    [-89.9, 90],
  ])('display matrix rotation %s -> %s clockwise', (matrix, clockwise) => {
    const { probe } = describeProbe({
      streams: [video({ side_data_list: [{ side_data_type: 'Display Matrix', rotation: matrix }] })],
      format,
    });
    expect(probe.rotation).toBe(clockwise);
    const turned = clockwise === 90 || clockwise === 270;
    expect([probe.displayWidth, probe.displayHeight]).toEqual(turned ? [1080, 1920] : [1920, 1080]);
  });

  it('falls back to the older clockwise rotate tag', () => {
    expect(describeProbe({ streams: [video({ tags: { rotate: '90' } })], format }).probe.rotation).toBe(90);
    expect(describeProbe({ streams: [video({ tags: { rotate: '-90' } })], format }).probe.rotation).toBe(270);
  });

  it('reads field-coded video as interlaced', () => {
    expect(describeProbe({ streams: [video({ field_order: 'tt' })], format }).probe.interlaced).toBe(true);
    expect(describeProbe({ streams: [video({ field_order: 'progressive' })], format }).probe.interlaced).toBe(false);
  });

  it('applies the sample aspect ratio to the shown size', () => {
    const { probe } = describeProbe({ streams: [video({ width: 720, height: 576, sample_aspect_ratio: '4:3' })], format });
    expect([probe.displayWidth, probe.displayHeight]).toEqual([960, 576]);
  });

  it('takes the base rate when the average is unknown, and reports the rates disagreeing', () => {
    const details = describeProbe({ streams: [video({ avg_frame_rate: '0/0', r_frame_rate: '25/1' })], format });
    expect(details.probe.frameRate).toBe(25);
    expect(details.ratesAgree).toBe(false);
  });

  it('ignores cover art and calls an audio file one without a video track', () => {
    const cover = video({ codec_name: 'mjpeg', disposition: { attached_pic: 1 } });
    const run = () => describeProbe({ streams: [audio, cover], format });
    expect(run).toThrow(MediaFailure);
    expect(run).toThrow('This file has no video track — it may be an audio recording.');
  });

  it('refuses a video without a duration', () => {
    expect(() => describeProbe({ streams: [video({ duration: 'N/A' })], format: { format_name: 'h264' } })).toThrow(
      expect.objectContaining({ code: 'unreadable' }),
    );
  });

  it('computes the bitrate from the size when the container gives none', () => {
    const { probe } = describeProbe({ streams: [video()], format: { ...format, bit_rate: undefined } });
    expect(probe.bitrate).toBe(Math.round((15_030_000 * 8) / 10.02));
  });
});
