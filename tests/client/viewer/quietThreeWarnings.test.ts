import * as THREE from 'three';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { quietThreeWarnings } from '@/components/viewer/quietThreeWarnings';

describe('quieting three.js', () => {
  afterEach(() => vi.restoreAllMocks());

  it('drops only the Clock deprecation that every fiber canvas triggers, and still passes other three.js warnings on', () => {
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => {});
    quietThreeWarnings();
    new THREE.Clock();
    expect(warn).not.toHaveBeenCalled();
    THREE.warn('Material: some other problem', 42);
    expect(warn).toHaveBeenCalledWith('THREE.Material: some other problem', 42);
  });
});
