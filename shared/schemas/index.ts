export * from './common';
export * from './trip';
export * from './rig';
export * from './appliance';
export * from './options';
export * from './engine-input';
export * from './limits';
