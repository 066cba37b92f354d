import { PageHeader } from '../../components/ui/page-header';

export function Component() {
  return (
    <>
      <PageHeader title="Welcome to Shoalwise" subtitle="Your club's tanks, water tests and mentors in one place." />
      <section className="rounded-card bg-white p-5 shadow-card">
        <p className="text-tide-800">
          Log your water tests, watch your tank through the nitrogen cycle, and let your mentor spot trouble early.
        </p>
      </section>
    </>
  );
}
