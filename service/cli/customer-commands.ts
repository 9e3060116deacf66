import type { Command } from './commands';
import { subcommandOf } from './commands';
import type { ParsedArgs } from './io';
import { readJson, toJson } from './io';
import type { Caller } from './store-session';
import { positional, withStore } from './store-session';

type Sub = (args: ParsedArgs, call: Caller) => Promise<unknown>;

const subcommands: Record<string, Sub> = {
  list: async (_args, call) => call('listCustomers', {}),
  save: async (args, call) => call('saveCustomer', readJson(positional(args, 1, 'FILE', 'customers save')) as never),
};

export const customersCommand: Command = {
  name: 'customers',
  usage: [
    'customers list --db DB     the customers with their contact, address and payment terms',
    '  customers save FILE --db DB   add a customer, or edit one when the file gives its "id"',
    '  ({"name":…,"contact":…,"email":…,"phone":…,"addressLines":[…],"paymentTerms":…})',
  ].join('\n'),
  async run(args, out) {
    const sub = subcommandOf('customers', args, subcommands);
    out(toJson(await withStore(args, (call) => sub(args, call))));
  },
};
