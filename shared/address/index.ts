export * from '@/shared/address/ip';
export * from '@/shared/address/cidr';
export * from '@/shared/address/assign';
