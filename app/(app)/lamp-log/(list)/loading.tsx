// This page never calls notFound(), so it may sit below a loading boundary (see PageSkeleton).
export { PageSkeleton as default } from '@/components/shell/PageSkeleton';
