import { describe, expect, it } from 'vitest';
import type { StoreInfo } from '../../core/api';
import { storeLabel, storeShortLabel } from '../../renderer/hooks/store-info';

const info = (backend: StoreInfo['backend'], name: string) => ({ backend, name } as StoreInfo);

describe('the store as the header names it', () => {
  it('names a file by its name alone, on any system, and keeps the whole path for the title', () => {
    expect(storeShortLabel(info('sqlite', '/home/shop/estimating/coilwright.db'))).toBe('coilwright.db');
    expect(storeShortLabel(info('sqlite', 'C:\\Users\\estimator\\AppData\\Roaming\\Coilwright\\coilwright.db'))).toBe('coilwright.db');
    expect(storeShortLabel(info('sqlite', 'shop.db'))).toBe('shop.db');
    expect(storeLabel(info('sqlite', '/home/shop/estimating/coilwright.db'))).toBe('/home/shop/estimating/coilwright.db');
  });

  it('names a server store by its host, port and database, as before', () => {
    expect(storeShortLabel(info('postgres', '127.0.0.1:5432/shop_floor'))).toBe('PostgreSQL 127.0.0.1:5432/shop_floor');
  });
});
