// Case ids come from the address (/cases/12). Anything but a positive PostgreSQL integer names no case,
// and the page says "not found" without asking the API.

const largestId = 2_147_483_647;

/** The id in a route parameter; throws the router's 404 for anything else. */
export function caseIdOf(param: string | undefined): number {
  const id = Number(param);
  if (param === undefined || !/^\d+$/.test(param) || id <= 0 || id > largestId) {
    throw new Response('No such case', { status: 404, statusText: 'No such case' });
  }
  return id;
}
